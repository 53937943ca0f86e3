import { useQuery } from '@tanstack/react-query'
import { CalendarClock } from 'lucide-react'
import { useState } from 'react'
import type { Task } from '#shared/schemas/task'
import { Button } from '../../../components/ui/button'
import { ErrorState, LoadingState } from '../../../components/ui/page-state'
import { routineQueries } from '../api/routine-queries'
import { addDays, formatLocalDate, longWeekdayOf, todayIn } from '../utils/zone-dates'
import { TaskStatusLabel } from './task-status-label'

const DAYS = 14

function byDate(tasks: Task[]) {
  const groups = new Map<string, Task[]>()
  for (const t of tasks) groups.set(t.localDate, [...(groups.get(t.localDate) ?? []), t])
  return [...groups]
}

export function RoutineUpcomingTasks({ routineId, timeZone, paused }: { routineId: number; timeZone: string; paused: boolean }) {
  const [from] = useState(() => todayIn(timeZone))
  const to = addDays(from, DAYS - 1)
  const tasks = useQuery(routineQueries.upcomingTasks(routineId, from, to))

  return (
    <section aria-labelledby="upcoming-tasks-heading" className="rounded-xl border border-tide-200 bg-white p-4 md:p-5">
      <h2 id="upcoming-tasks-heading" className="flex items-center gap-2 text-lg font-bold text-tide-900">
        <CalendarClock aria-hidden className="size-5 text-tide-600" /> Upcoming tasks
      </h2>
      <p className="mt-0.5 text-sm text-tide-600">The next {DAYS} days, facility time ({timeZone}).</p>
      {tasks.isPending && <LoadingState label="Loading tasks…" />}
      {tasks.isError && (
        <ErrorState
          title="Could not load the tasks"
          message={tasks.error.message}
          action={<Button variant="secondary" onClick={() => void tasks.refetch()}>Try again</Button>}
        />
      )}
      {tasks.isSuccess && tasks.data.length === 0 && (
        <p className="mt-4 text-tide-700">
          {paused ? 'Paused: no tasks are planned until the routine is resumed.' : 'No tasks in the next two weeks. Check the rule, the targets and the active period.'}
        </p>
      )}
      {tasks.isSuccess && tasks.data.length > 0 && (
        <div className="mt-4 flex flex-col gap-4">
          {byDate(tasks.data).map(([date, dayTasks]) => (
            <section key={date} aria-label={`${longWeekdayOf(date)} ${formatLocalDate(date)}`}>
              <h3 className="flex items-baseline justify-between gap-2 border-b border-tide-200 pb-1 font-semibold text-tide-900">
                <span>{longWeekdayOf(date)} {formatLocalDate(date)}</span>
                <span className="text-sm font-normal text-tide-600">{dayTasks.length} {dayTasks.length === 1 ? 'task' : 'tasks'}</span>
              </h3>
              <ul className="divide-y divide-tide-100">
                {dayTasks.map((t) => (
                  <li key={t.id} className="grid grid-cols-[3.5rem_minmax(0,1fr)] items-center gap-x-3 gap-y-0.5 py-2 sm:grid-cols-[3.5rem_minmax(0,1fr)_auto]">
                    <span className="font-semibold text-tide-900 tabular-nums">{t.localTime}</span>
                    <span className="min-w-0 truncate text-tide-800">
                      {t.targetLabel}
                      {t.assigneeName && <span className="text-sm text-tide-600"> · {t.assigneeName}</span>}
                    </span>
                    <span className="col-start-2 sm:col-start-auto"><TaskStatusLabel status={t.status} /></span>
                  </li>
                ))}
              </ul>
            </section>
          ))}
        </div>
      )}
    </section>
  )
}
