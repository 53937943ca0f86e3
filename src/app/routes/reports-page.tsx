import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query'
import { History } from 'lucide-react'
import { Link, useSearchParams, type LoaderFunctionArgs } from 'react-router-dom'
import { catalogueQueries } from '../../api/catalogues'
import { facilityQueries, requireFacility } from '../../api/facility'
import { ErrorState, PageHeader } from '../../components/ui/page-state'
import { reportQueries } from '../../features/reports/api/report-queries'
import { ComplianceReport } from '../../features/reports/components/compliance-report'
import { PrintHeading } from '../../features/reports/components/print-heading'
import { RangeForm } from '../../features/reports/components/range-form'
import { parseReportView, ReportTabs } from '../../features/reports/components/report-tabs'
import { IncidentDeadlinesReport } from '../../features/reports/components/incident-deadlines-report'
import { ResponsesReport } from '../../features/reports/components/responses-report'
import { StockReport } from '../../features/reports/components/stock-report'
import { WelfareReport } from '../../features/reports/components/welfare-report'
import { describeRange, rangeProblem } from '../../features/reports/utils/date-range'
import { reportFilters } from '../../features/reports/utils/report-filters'
import type { DateRange } from '../../features/reports/utils/report-paths'
import { useSearchUpdate } from '../../lib/use-search-update'
import '../../features/reports/report-print.css'

export const loader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const search = new URL(request.url).searchParams
    const facility = await queryClient.ensureQueryData(facilityQueries.facility()).then(requireFacility)
    const f = reportFilters(search, facility.timeZone)
    if (rangeProblem(f.range)) return null
    const view = parseReportView(search.get('view'))
    if (view === 'compliance') await queryClient.ensureQueryData(reportQueries.compliance(f.compliance))
    if (view === 'responses') await queryClient.ensureQueryData(reportQueries.responses(f.range))
    if (view === 'welfare')
      await Promise.all([queryClient.ensureQueryData(reportQueries.welfare(f.welfare)), queryClient.ensureQueryData(catalogueQueries.tanks())])
    if (view === 'animals') {
      await Promise.all([
        queryClient.ensureQueryData(reportQueries.stock(f.stock)),
        queryClient.ensureQueryData(reportQueries.incidents(f.range)),
        queryClient.ensureQueryData(catalogueQueries.batches()),
      ])
    }
    return null
  }

const TITLES = {
  compliance: 'Compliance',
  responses: 'Response times',
  welfare: 'Welfare-check record',
  animals: 'Animal record: numbers per batch and incidents',
}

export function Component() {
  const [search] = useSearchParams()
  const update = useSearchUpdate({ preventScrollReset: true })
  const { data: facility } = useSuspenseQuery(facilityQueries.required())
  const view = parseReportView(search.get('view'))
  const f = reportFilters(search, facility.timeZone)
  const problem = rangeProblem(f.range)
  const setRange = (r: DateRange) => update({ from: r.from, to: r.to })

  return (
    <section data-print-layout className="flex flex-col gap-4">
      <PageHeader title="Reports">
        <Link
          to={`/audit?from=${f.range.from}&to=${f.range.to}`}
          className="inline-flex min-h-11 items-center gap-2 font-semibold text-tide-700 underline print:hidden"
        >
          <History aria-hidden className="size-4" /> Audit trail
        </Link>
      </PageHeader>
      <PrintHeading facility={facility.name} title={TITLES[view]} range={describeRange(f.range)} />
      <RangeForm key={`${f.range.from}|${f.range.to}`} range={f.range} onChange={setRange} />
      <ReportTabs current={view} />
      {problem ? (
        <ErrorState title="Choose another range" message={problem} />
      ) : (
        <>
          <p className="text-sm text-tide-800 print:hidden">
            {describeRange(f.range)} · facility days in {facility.timeZone}
          </p>
          {view === 'compliance' && <ComplianceReport filter={f.compliance} onFilterChange={(c) => update(c)} />}
          {view === 'responses' && <ResponsesReport range={f.range} />}
          {view === 'welfare' && <WelfareReport filter={f.welfare} onTanksChange={(ids) => update({ tankIds: ids.join(',') })} />}
          {view === 'animals' && (
            <>
              <StockReport filter={f.stock} onBatchChange={(batchId) => update({ batchId })} />
              <IncidentDeadlinesReport range={f.range} timeZone={facility.timeZone} />
            </>
          )}
        </>
      )}
    </section>
  )
}
