import { CATEGORY_LABELS, CategorySchema } from '#shared/schemas/routine'
import type { ComplianceRow } from '#shared/schemas/report'
import { percent } from '../utils/on-time'
import { ReportTable, type ReportColumn } from './report-table'

const groupLabel = (group: string) => {
  const category = CategorySchema.safeParse(group)
  return category.success ? CATEGORY_LABELS[category.data] : group
}

const COLUMNS: ReadonlyArray<ReportColumn<ComplianceRow>> = [
  { label: 'Period', cell: (r) => r.period },
  { label: 'Group', cell: (r) => groupLabel(r.group) },
  { label: 'Total', cell: (r) => r.total, numeric: true },
  { label: 'On time', cell: (r) => r.onTime, numeric: true },
  { label: 'Late', cell: (r) => r.late, numeric: true },
  { label: 'Missed', cell: (r) => r.missed, numeric: true },
  { label: 'Skipped', cell: (r) => r.skipped, numeric: true },
  { label: 'Held', cell: (r) => r.held, numeric: true },
  { label: 'Open', cell: (r) => r.open, numeric: true },
  { label: 'On-time rate', cell: (r) => percent(r.onTimeRate), numeric: true },
]

export function ComplianceTable({ rows }: { rows: ComplianceRow[] }) {
  return (
    <ReportTable caption="Compliance" columns={COLUMNS} rows={rows} rowKey={(r) => `${r.period}|${r.group}`} emptyText="No tasks were due in this range." />
  )
}
