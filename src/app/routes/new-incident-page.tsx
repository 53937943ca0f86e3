import { useQuery, useSuspenseQuery, type QueryClient } from '@tanstack/react-query'
import { Link, useNavigate } from 'react-router-dom'
import { toast } from 'sonner'
import { catalogueQueries } from '../../api/catalogues'
import { facilityQueries } from '../../api/facility'
import { PageHeader } from '../../components/ui/page-state'
import { QueryState } from '../../components/ui/query-state'
import { authQueries } from '../../features/auth/api/auth-queries'
import { FileIncidentForm } from '../../features/incidents/components/file-incident-form'

// Not awaited: the page shows its own loading, offline and error states.
export const loader = (queryClient: QueryClient) => () => {
  void queryClient.prefetchQuery(catalogueQueries.tanks())
  void queryClient.prefetchQuery(catalogueQueries.batches())
  return null
}

/** An escape, an injury during handling, a power cut: what Roundtide cannot see, filed by the person who saw it. */
export function Component() {
  const navigate = useNavigate()
  const { data: me } = useSuspenseQuery(authQueries.me())
  const tanks = useQuery(catalogueQueries.tanks())
  const batches = useQuery(catalogueQueries.batches())
  const zone = useQuery(facilityQueries.timeZone())
  const needsReview = me.role === 'technician'
  return (
    <section className="mx-auto flex w-full max-w-4xl flex-col gap-4">
      <Link to="/incidents" className="text-sm font-semibold text-tide-700 underline">
        ← All incidents
      </Link>
      <PageHeader title="File an incident" />
      {me.role === 'observer' ? (
        <p className="rounded-xl border border-dashed border-tide-300 bg-white p-4 text-tide-700">
          Observers read incidents and add notes; a technician, supervisor or manager files them.
        </p>
      ) : (
        <QueryState queries={[tanks, batches, zone]} what="the tanks and batches">
          {() => (
            <FileIncidentForm
              timeZone={zone.data!}
              tanks={tanks.data!.map((t) => ({ id: t.id, label: `${t.code} · ${t.name}` }))}
              batches={batches.data!.map((b) => ({ id: b.id, label: `${b.code} · ${b.species}` }))}
              needsReview={needsReview}
              onFiled={(incident) => {
                toast.success(needsReview ? `Incident #${incident.id} filed; a supervisor confirms it.` : `Incident #${incident.id} filed and open.`)
                void navigate(`/incidents/${incident.id}`)
              }}
            />
          )}
        </QueryState>
      )}
    </section>
  )
}
