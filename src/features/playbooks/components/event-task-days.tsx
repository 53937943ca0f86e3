import { useQuery } from '@tanstack/react-query'
import { CirclePause } from 'lucide-react'
import { Link } from 'react-router-dom'
import type { FacilityEvent, Playbook } from '#shared/schemas/playbook'
import type { Task } from '#shared/schemas/task'
import { Button } from '../../../components/ui/button'
import { ErrorState, LoadingState } from '../../../components/ui/page-state'
import { playbookQueries } from '../api/playbook-queries'
import { formatLongDate } from '../utils/zone-format'
import { TaskStatusLabel } from '../../../components/ui/task-status-label'

function byDate(tasks: Task[]) {
  const days = new Map<string, Task[]>()
  for (const t of tasks) days.set(t.localDate, [...(days.get(t.localDate) ?? []), t])
  return [...days]
}

/** The event's tasks and the feeds it holds, day by day, each with its status. */
export function EventTaskDays({ event, playbook, zone }: { event: FacilityEvent; playbook: Playbook; zone: string }) {
  const tasks = useQuery(playbookQueries.eventTasks(event, playbook, zone))
  return (
    <section aria-labelledby="event-tasks-heading" className="flex flex-col gap-3">
      <h2 id="event-tasks-heading" className="text-xl font-bold text-tide-900">
        Tasks by day
      </h2>
      {tasks.isPending && <LoadingState label="Loading tasks…" />}
      {tasks.isError && (
        <ErrorState
          title="Could not load the tasks"
          message={tasks.error.message}
          action={
            <Button variant="secondary" onClick={() => void tasks.refetch()}>
              Try again
            </Button>
          }
        />
      )}
      {tasks.isSuccess && tasks.data.length === 0 && <p className="text-tide-700">No tasks: the event was cancelled before any were done, or has no tanks.</p>}
      {tasks.isSuccess &&
        byDate(tasks.data).map(([date, day]) => (
          <section key={date} aria-label={formatLongDate(date)} className="rounded-xl border border-tide-200 bg-white px-4 py-2">
            <h3 className="flex items-baseline justify-between gap-2 border-b border-tide-100 py-1 font-semibold text-tide-900">
              <span>{formatLongDate(date)}</span>
              <span className="text-sm font-normal text-tide-600">
                {day.length} {day.length === 1 ? 'task' : 'tasks'}
              </span>
            </h3>
            <ul className="divide-y divide-tide-100">
              {day.map((t) => (
                <li key={t.id} className="grid grid-cols-[3.5rem_minmax(0,1fr)] gap-x-3 gap-y-0.5 py-2 sm:grid-cols-[3.5rem_minmax(0,1fr)_8rem]">
                  <span className="font-semibold tabular-nums text-tide-900">{t.localTime}</span>
                  <span className="min-w-0">
                    <Link to={`/tasks/${t.id}`} className="text-tide-900 hover:underline">
                      {t.title}
                    </Link>
                    <span className="block text-sm text-tide-600">
                      {t.targetLabel}
                      {t.assigneeName ? ` · ${t.assigneeName}` : ''}
                    </span>
                    {t.status === 'held' && (
                      <span className="flex items-center gap-1 text-sm text-tide-700">
                        <CirclePause aria-hidden className="size-4" /> {t.heldReason}
                      </span>
                    )}
                  </span>
                  <span className="col-start-2 sm:col-start-auto">
                    <TaskStatusLabel status={t.status} />
                  </span>
                </li>
              ))}
            </ul>
          </section>
        ))}
    </section>
  )
}
