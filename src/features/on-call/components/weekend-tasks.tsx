import { CalendarRange } from 'lucide-react'
import { TASK_STATUSES, type Task } from '#shared/schemas/task'
import { formatDay } from '../../../lib/zone-format'
import { OnCallSection } from './on-call-section'
import { STATUS_LOOK, TaskStatusLabel } from '../../../components/ui/task-status-label'

/** The weekend's work: how much is in each state, then each task in time order. */
export function WeekendTasks({ from, to, tasks }: { from: string; to: string; tasks: Task[] }) {
  const counts = TASK_STATUSES.map((status) => ({ status, n: tasks.filter((t) => t.status === status).length })).filter((c) => c.n > 0)
  return (
    <OnCallSection title={`This weekend (${formatDay(from)} – ${formatDay(to)})`} icon={CalendarRange} count={tasks.length}>
      {tasks.length === 0 ? (
        <p className="text-tide-700">No tasks are planned for the weekend.</p>
      ) : (
        <>
          <ul aria-label="Weekend tasks by status" className="mb-3 flex flex-wrap gap-2">
            {counts.map(({ status, n }) => {
              const look = STATUS_LOOK[status]
              return (
                <li key={status} className={`inline-flex items-center gap-1 rounded-full bg-tide-50 px-3 py-1 text-sm font-semibold ${look.tone}`}>
                  <look.icon aria-hidden className="size-4" /> {n} {look.label.toLowerCase()}
                </li>
              )
            })}
          </ul>
          <ul aria-label="Weekend tasks" className="divide-y divide-tide-100 lg:max-h-[32rem] lg:overflow-y-auto">
            {tasks.map((t) => (
              <li key={t.id} className="flex items-start justify-between gap-3 py-2">
                <span className="min-w-0">
                  <span className="block font-semibold text-tide-900">
                    {formatDay(t.localDate).split(' ')[0]} {t.localTime.slice(0, 5)} · {t.title}
                  </span>
                  <span className="block truncate text-sm text-tide-600">
                    {t.targetLabel} · {t.assigneeName ?? 'Unassigned'}
                  </span>
                </span>
                <TaskStatusLabel status={t.status} />
              </li>
            ))}
          </ul>
        </>
      )}
    </OnCallSection>
  )
}
