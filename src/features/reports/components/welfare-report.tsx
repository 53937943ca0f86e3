import { useSuspenseQuery } from '@tanstack/react-query'
import { catalogueQueries } from '../../../api/catalogues'
import { STATUS_LOOK } from '../../../components/ui/task-status-label'
import { reportQueries } from '../api/report-queries'
import type { WelfareRow } from '#shared/schemas/report'
import { csvHref, type WelfareFilter } from '../utils/report-paths'
import { FlagText } from './flag-text'
import { ReportActions } from './report-actions'
import { ReportTable, type ReportColumn } from './report-table'
import { TankFilter } from './tank-filter'

const COLUMNS: ReadonlyArray<ReportColumn<WelfareRow>> = [
  { label: 'Date', cell: (r) => r.date },
  { label: 'Due', cell: (r) => r.due },
  { label: 'Check', cell: (r) => r.task, wrap: true },
  { label: 'Tank', cell: (r) => r.tank, wrap: true },
  { label: 'Status', cell: (r) => (r.status === 'missed' ? <FlagText flag="missed" /> : STATUS_LOOK[r.status].label) },
  { label: 'Done by', cell: (r) => r.doneBy || '—' },
  { label: 'Late', cell: (r) => (r.lateMinutes === '' ? '—' : `${r.lateMinutes} min`), numeric: true },
  { label: 'Readings', cell: (r) => r.readings || '—', wrap: true },
  { label: 'Flag', cell: (r) => <FlagText flag={r.flag} /> },
]

interface WelfareReportProps {
  filter: WelfareFilter
  onTanksChange: (ids: number[]) => void
}

/** Every welfare and quarantine check in the range for the chosen tanks: who, when, and what they read. */
export function WelfareReport({ filter, onTanksChange }: WelfareReportProps) {
  const { data: rows } = useSuspenseQuery(reportQueries.welfare(filter))
  const { data: tanks } = useSuspenseQuery(catalogueQueries.tanks())
  const chosen = tanks.filter((t) => filter.tankIds.includes(t.id)).map((t) => t.code)
  return (
    <section aria-labelledby="welfare-heading" className="flex flex-col gap-3">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <h2 id="welfare-heading" className="text-xl font-bold text-tide-900">
          Welfare-check record
        </h2>
        <ReportActions csvHref={csvHref('welfare', filter)} label="welfare checks" />
      </div>
      <p className="text-sm text-tide-800">
        {chosen.length ? `Tanks ${chosen.join(', ')}` : 'All tanks'} · {rows.length} checks
      </p>
      <TankFilter key={filter.tankIds.join(',')} tanks={tanks} selected={filter.tankIds} onChange={onTanksChange} />
      <ReportTable
        caption="Welfare checks"
        columns={COLUMNS}
        rows={rows}
        rowKey={(r, i) => `${r.date}-${r.due}-${r.tank}-${i}`}
        emptyText="No welfare checks in this range."
      />
    </section>
  )
}
