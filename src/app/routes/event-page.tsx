import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query'
import { ArrowLeft } from 'lucide-react'
import { Link, useParams, type LoaderFunctionArgs, type Params } from 'react-router-dom'
import { catalogueQueries as refs } from '../../api/catalogues'
import { facilityQueries } from '../../api/facility'
import { PageHeader } from '../../components/ui/page-state'
import { authQueries } from '../../features/auth/api/auth-queries'
import { playbookQueries } from '../../features/playbooks/api/playbook-queries'
import { EventSummary } from '../../features/playbooks/components/event-summary'
import { EventTaskDays } from '../../features/playbooks/components/event-task-days'

function eventIdFrom(params: Params): number {
  const id = Number(params.id)
  if (!Number.isInteger(id) || id <= 0) throw new Response('Not found', { status: 404 })
  return id
}

export const loader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const id = eventIdFrom(params)
    const [event] = await Promise.all([
      queryClient.ensureQueryData(playbookQueries.event(id)),
      queryClient.ensureQueryData(facilityQueries.facility()),
      queryClient.ensureQueryData(refs.tanks()),
      queryClient.ensureQueryData(refs.batches()),
    ])
    await queryClient.ensureQueryData(playbookQueries.detail(event.playbookId))
    return null
  }

export function Component() {
  const id = eventIdFrom(useParams())
  const { data: me } = useSuspenseQuery(authQueries.me())
  const { data: event } = useSuspenseQuery(playbookQueries.event(id))
  const { data: playbook } = useSuspenseQuery(playbookQueries.detail(event.playbookId))
  const { data: zone } = useSuspenseQuery(facilityQueries.timeZone())
  const { data: tanks } = useSuspenseQuery(refs.tanks())
  const { data: batches } = useSuspenseQuery(refs.batches())
  const canManage = me.role === 'manager' || me.role === 'supervisor'

  return (
    <section className="mx-auto flex w-full max-w-5xl flex-col gap-4">
      <Link to="/playbooks" className="inline-flex min-h-11 items-center gap-1 self-start font-semibold text-tide-700 hover:underline">
        <ArrowLeft aria-hidden className="size-4" /> Playbooks & events
      </Link>
      <PageHeader title={event.title} />
      <EventSummary event={event} playbook={playbook} tanks={tanks} batches={batches} zone={zone} canManage={canManage} />
      <EventTaskDays event={event} playbook={playbook} zone={zone} />
    </section>
  )
}
