import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query'
import { useParams, type LoaderFunctionArgs, type Params } from 'react-router-dom'
import { facilityQueries } from '../../api/facility'
import { parameterQueries } from '../../api/parameters'
import { PageHeader } from '../../components/ui/page-state'
import { authQueries } from '../../features/auth/api/auth-queries'
import { escalationQueries } from '../../features/escalation/api/escalation-queries'
import { EscalationHistory } from '../../features/escalation/components/escalation-history'
import { TaskSummary } from '../../features/escalation/components/task-summary'

function taskIdFrom(params: Params): number {
  const id = Number(params.id)
  if (!Number.isInteger(id) || id <= 0) throw new Response('Not found', { status: 404 })
  return id
}

export const loader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const id = taskIdFrom(params)
    await Promise.all([
      queryClient.ensureQueryData(escalationQueries.task(id)),
      queryClient.ensureQueryData(escalationQueries.record(id)),
      queryClient.ensureQueryData(facilityQueries.timeZone()),
      queryClient.ensureQueryData(parameterQueries.parameters()),
    ])
    return null
  }

export function Component() {
  const id = taskIdFrom(useParams())
  const { data: me } = useSuspenseQuery(authQueries.me())
  const { data: task } = useSuspenseQuery(escalationQueries.task(id))
  const { data: alerts } = useSuspenseQuery(escalationQueries.record(id))
  const { data: timeZone } = useSuspenseQuery(facilityQueries.timeZone())
  const { data: parameters } = useSuspenseQuery(parameterQueries.parameters())
  const readingNames = new Map(parameters.map((p) => [p.key, p.unit ? `${p.name} (${p.unit})` : p.name]))

  return (
    <section className="mx-auto flex w-full max-w-5xl flex-col gap-4">
      <PageHeader title={task.title} />
      <TaskSummary task={task} timeZone={timeZone} readingNames={readingNames} />
      <EscalationHistory alerts={alerts} taskId={task.id} timeZone={timeZone} canAcknowledge={me.role !== 'observer'} />
    </section>
  )
}
