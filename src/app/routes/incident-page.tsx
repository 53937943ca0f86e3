import { useQuery, useSuspenseQuery, type QueryClient } from '@tanstack/react-query'
import { useState } from 'react'
import { Link, useParams, type LoaderFunctionArgs, type Params } from 'react-router-dom'
import { deadlineStatuses } from '#shared/incidents/deadlines'
import { catalogueQueries } from '../../api/catalogues'
import { facilityQueries } from '../../api/facility'
import { staffQueries } from '../../api/staff'
import { Button } from '../../components/ui/button'
import { PageHeader } from '../../components/ui/page-state'
import { QueryState } from '../../components/ui/query-state'
import { authQueries } from '../../features/auth/api/auth-queries'
import { incidentQueries } from '../../features/incidents/api/incident-queries'
import { DecideForm } from '../../features/incidents/components/decide-form'
import { IncidentDeadlines } from '../../features/incidents/components/incident-deadlines'
import { IncidentDetails } from '../../features/incidents/components/incident-details'
import { IncidentEditForm } from '../../features/incidents/components/incident-edit-form'
import { IncidentNoteForm } from '../../features/incidents/components/incident-note-form'
import { IncidentStatusLabel } from '../../features/incidents/components/incident-status-label'
import { IncidentTimeline } from '../../features/incidents/components/incident-timeline'
import { useNow } from '../../features/incidents/hooks/use-now'

function incidentIdFrom(params: Params): number {
  const id = Number(params.id)
  if (!Number.isInteger(id) || id <= 0) throw new Response('Not found', { status: 404 })
  return id
}

export const loader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) => {
    void queryClient.prefetchQuery(incidentQueries.detail(incidentIdFrom(params)))
    return null
  }

export function Component() {
  const id = incidentIdFrom(useParams())
  const { data: me } = useSuspenseQuery(authQueries.me())
  const canDecide = me.role === 'manager' || me.role === 'supervisor'
  const [editing, setEditing] = useState(false)
  const now = useNow()
  const incident = useQuery(incidentQueries.detail(id))
  const tanks = useQuery(catalogueQueries.tanks())
  const batches = useQuery(catalogueQueries.batches())
  const zone = useQuery(facilityQueries.timeZone())
  const staff = useQuery({ ...staffQueries.staff(), enabled: canDecide })

  return (
    <section className="mx-auto flex w-full max-w-6xl flex-col gap-4">
      <Link to="/incidents" className="text-sm font-semibold text-tide-700 underline">
        ← All incidents
      </Link>
      <QueryState queries={[incident, tanks, batches, zone]} what="this incident">
        {() => {
          const i = incident.data!
          const timeZone = zone.data!
          const deadlines = deadlineStatuses(i, now)
          const editable = canDecide && (i.status === 'open' || i.status === 'reported' || i.status === 'closed')
          return (
            <>
              <PageHeader title={`Incident #${i.id}: ${i.title}`}>
                <IncidentStatusLabel status={i.status} />
              </PageHeader>
              {canDecide && i.status === 'proposed' && <DecideForm incidentId={i.id} />}
              <div className="grid gap-4 lg:grid-cols-[3fr_2fr]">
                <div className="flex min-w-0 flex-col gap-4">
                  <div className="flex flex-wrap items-center justify-between gap-2">
                    <h2 className="text-xl font-bold text-tide-900">Record</h2>
                    {editable && !editing && (
                      <Button variant="secondary" onClick={() => setEditing(true)}>
                        Fill in the record
                      </Button>
                    )}
                  </div>
                  {editing ? (
                    <IncidentEditForm
                      incident={i}
                      timeZone={timeZone}
                      tanks={tanks.data!.map((t) => ({ id: t.id, label: `${t.code} · ${t.name}` }))}
                      batches={batches.data!.map((b) => ({ id: b.id, label: `${b.code} · ${b.species}` }))}
                      people={(staff.data ?? i.people).map((p) => ({ id: p.id, label: p.name }))}
                      onDone={() => setEditing(false)}
                    />
                  ) : (
                    <IncidentDetails
                      incident={i}
                      timeZone={timeZone}
                      tankCodes={new Map(tanks.data!.map((t) => [t.id, t.code]))}
                      batchCodes={new Map(batches.data!.map((b) => [b.id, b.code]))}
                    />
                  )}
                </div>
                {/* On a phone the deadlines and the timeline come first: they are what a reader checks. */}
                <div className="order-first flex min-w-0 flex-col gap-4 lg:order-none">
                  <IncidentDeadlines deadlines={deadlines} now={now} timeZone={timeZone} />
                  <section aria-labelledby="timeline-heading" className="flex flex-col gap-2 rounded-xl border border-tide-200 bg-white p-4">
                    <h2 id="timeline-heading" className="text-lg font-bold text-tide-900">
                      Timeline
                    </h2>
                    <IncidentTimeline incident={i} deadlines={deadlines} now={now} timeZone={timeZone} />
                    {me.role !== 'technician' && <IncidentNoteForm incidentId={i.id} />}
                  </section>
                </div>
              </div>
            </>
          )
        }}
      </QueryState>
    </section>
  )
}
