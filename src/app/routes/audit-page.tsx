import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query'
import { BarChart3 } from 'lucide-react'
import { Link, useSearchParams, type LoaderFunctionArgs } from 'react-router-dom'
import { facilityQueries, requireFacility } from '../../api/facility'
import { staffQueries } from '../../api/staff'
import { ErrorState, PageHeader } from '../../components/ui/page-state'
import { authQueries } from '../../features/auth/api/auth-queries'
import { reportQueries } from '../../features/reports/api/report-queries'
import { AuditKindSelect } from '../../features/reports/components/audit-kind-select'
import { AuditList } from '../../features/reports/components/audit-list'
import { PrintHeading } from '../../features/reports/components/print-heading'
import { RangeForm } from '../../features/reports/components/range-form'
import { useSearchUpdate } from '../../lib/use-search-update'
import { ReportActions } from '../../features/reports/components/report-actions'
import { describeRange, rangeFrom, rangeProblem } from '../../features/reports/utils/date-range'
import { csvHref, type AuditFilter } from '../../features/reports/utils/report-paths'
import '../../features/reports/report-print.css'

const filterFrom = (search: URLSearchParams, timeZone: string): AuditFilter => ({ ...rangeFrom(search, timeZone), entity: search.get('entity') ?? '' })

export const loader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const [facility, me] = await Promise.all([
      queryClient.ensureQueryData(facilityQueries.facility()).then(requireFacility),
      queryClient.ensureQueryData(authQueries.me()),
    ])
    const filter = filterFrom(new URL(request.url).searchParams, facility.timeZone)
    await Promise.all([
      rangeProblem(filter) ? null : queryClient.ensureQueryData(reportQueries.audit(filter)),
      // Observers may not read the staff list; they see person numbers instead.
      me.role === 'manager' || me.role === 'supervisor' ? queryClient.ensureQueryData(staffQueries.staff()) : null,
    ])
    return null
  }

export function Component() {
  const [search] = useSearchParams()
  const update = useSearchUpdate()
  const { data: facility } = useSuspenseQuery(facilityQueries.required())
  const { data: me } = useSuspenseQuery(authQueries.me())
  const filter = filterFrom(search, facility.timeZone)
  const problem = rangeProblem(filter)

  return (
    <section data-print-layout className="flex flex-col gap-4">
      <PageHeader title="Audit trail">
        <Link
          to={`/reports?from=${filter.from}&to=${filter.to}`}
          className="inline-flex min-h-11 items-center gap-2 font-semibold text-tide-700 underline print:hidden"
        >
          <BarChart3 aria-hidden className="size-4" /> Reports
        </Link>
      </PageHeader>
      <PrintHeading facility={facility.name} title="Audit trail" range={describeRange(filter)} />
      <p className="max-w-2xl text-sm text-tide-800 print:hidden">
        Every change to routines, limits, ladders, the roster, people, events and completed records, with the values before and after. Nothing here is ever
        deleted.
      </p>
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div className="flex flex-wrap items-end gap-3 print:hidden">
          <RangeForm key={`${filter.from}|${filter.to}`} range={filter} onChange={(r) => update({ from: r.from, to: r.to })} />
          <AuditKindSelect value={filter.entity} onChange={(entity) => update({ entity })} />
        </div>
        {!problem && <ReportActions csvHref={csvHref('audit', filter)} label="audit trail" />}
      </div>
      {problem ? (
        <ErrorState title="Choose another range" message={problem} />
      ) : (
        <AuditList filter={filter} timeZone={facility.timeZone} canReadStaff={me.role === 'manager' || me.role === 'supervisor'} />
      )}
    </section>
  )
}
