import { useQuery, useSuspenseQuery, type QueryClient } from '@tanstack/react-query'
import { FilePlus2 } from 'lucide-react'
import { Link, useSearchParams } from 'react-router-dom'
import { catalogueQueries } from '../../api/catalogues'
import { facilityQueries } from '../../api/facility'
import { PageHeader } from '../../components/ui/page-state'
import { QueryState } from '../../components/ui/query-state'
import { authQueries } from '../../features/auth/api/auth-queries'
import { incidentQueries } from '../../features/incidents/api/incident-queries'
import { IncidentFilterBar } from '../../features/incidents/components/incident-filter-bar'
import { IncidentList } from '../../features/incidents/components/incident-list'
import { useNow } from '../../features/incidents/hooks/use-now'
import { filterIncidents, filtersFrom, type IncidentFilters } from '../../features/incidents/utils/incident-filters'

// Not awaited: the page shows its own loading, offline and error states.
export const loader = (queryClient: QueryClient) => () => {
  void queryClient.prefetchQuery(incidentQueries.list())
  void queryClient.prefetchQuery(catalogueQueries.tanks())
  return null
}

export function Component() {
  const { data: me } = useSuspenseQuery(authQueries.me())
  const [params, setParams] = useSearchParams()
  const filters = filtersFrom(params)
  const now = useNow()
  const list = useQuery(incidentQueries.list())
  const tanks = useQuery(catalogueQueries.tanks())
  const zone = useQuery(facilityQueries.timeZone())
  const change = (next: Partial<IncidentFilters>) =>
    setParams(
      (current) => {
        const p = new URLSearchParams(current)
        const f = { ...filters, ...next }
        p.set('status', f.status)
        if (f.overdueOnly) p.set('overdue', '1')
        else p.delete('overdue')
        if (f.text) p.set('q', f.text)
        else p.delete('q')
        return p
      },
      { replace: true },
    )

  return (
    <section className="mx-auto flex w-full max-w-5xl flex-col gap-4">
      <PageHeader title="Incidents">
        {me.role !== 'observer' && (
          <Link
            to="/incidents/new"
            className="inline-flex min-h-11 items-center justify-center gap-2 rounded-lg bg-tide-700 px-4 font-semibold text-white hover:bg-tide-800"
          >
            <FilePlus2 aria-hidden className="size-5" /> File an incident
          </Link>
        )}
      </PageHeader>
      <p className="text-sm text-tide-700">
        Roundtide proposes an incident when a welfare-critical check is missed, a critical reading is confirmed or deaths pass the threshold; a supervisor or
        manager confirms or dismisses it. What Roundtide cannot see (an escape, an injury during handling, a power cut) is filed by hand. Deadlines count down
        from when it was noticed.
      </p>
      <IncidentFilterBar filters={filters} onChange={change} />
      <QueryState queries={[list, tanks, zone]} what="the incidents">
        {() => {
          const shown = filterIncidents(list.data!, filters, now)
          if (list.data!.length === 0)
            return <p className="rounded-xl border border-dashed border-tide-300 bg-white p-4 text-tide-700">No incidents have been proposed or recorded.</p>
          if (shown.length === 0)
            return (
              <p className="rounded-xl border border-dashed border-tide-300 bg-white p-4 text-tide-700">
                No incident matches these filters ({list.data!.length} in all).
              </p>
            )
          return <IncidentList incidents={shown} now={now} timeZone={zone.data!} tankCodes={new Map(tanks.data!.map((t) => [t.id, t.code]))} />
        }}
      </QueryState>
    </section>
  )
}
