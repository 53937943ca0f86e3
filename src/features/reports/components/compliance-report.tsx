import { useSuspenseQuery } from '@tanstack/react-query'
import { reportQueries } from '../api/report-queries'
import { COMPLIANCE_GROUPINGS, REPORT_PERIODS } from '#shared/schemas/report'
import { csvHref, type ComplianceFilter } from '../utils/report-paths'
import { ComplianceTable } from './compliance-table'
import { OnTimeChart } from './on-time-chart'
import { ReportActions } from './report-actions'
import { ReportSelect } from './report-select'

const BY_LABELS: Record<ComplianceFilter['by'], string> = { category: 'Category', area: 'Area', person: 'Person' }
const PERIOD_LABELS: Record<ComplianceFilter['period'], string> = { day: 'Day', week: 'Week' }

interface ComplianceReportProps {
  filter: ComplianceFilter
  onFilterChange: (change: Partial<Pick<ComplianceFilter, 'by' | 'period'>>) => void
}

/** Tasks done on time, late, missed, skipped and held, per period and group. */
export function ComplianceReport({ filter, onFilterChange }: ComplianceReportProps) {
  const { data: rows } = useSuspenseQuery(reportQueries.compliance(filter))
  return (
    <section aria-labelledby="compliance-heading" className="flex flex-col gap-3">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <h2 id="compliance-heading" className="text-xl font-bold text-tide-900">
          Compliance by {BY_LABELS[filter.by].toLowerCase()}, per {filter.period}
        </h2>
        <ReportActions csvHref={csvHref('compliance', filter)} label="compliance" />
      </div>
      <div className="flex flex-wrap gap-3 print:hidden">
        <ReportSelect
          label="Group by"
          value={filter.by}
          options={COMPLIANCE_GROUPINGS.map((v) => ({ value: v, label: BY_LABELS[v] }))}
          onChange={(by) => onFilterChange({ by })}
        />
        <ReportSelect
          label="Per"
          value={filter.period}
          options={REPORT_PERIODS.map((v) => ({ value: v, label: PERIOD_LABELS[v] }))}
          onChange={(period) => onFilterChange({ period })}
        />
      </div>
      <OnTimeChart rows={rows} />
      <ComplianceTable rows={rows} />
    </section>
  )
}
