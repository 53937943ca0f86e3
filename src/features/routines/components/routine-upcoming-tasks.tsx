import { useQuery } from '@tanstack/react-query'
import { CalendarClock } from 'lucide-react'
import { useState } from 'react'
import type { Task } from '#shared/schemas/task'
import { Button } from '../../../components/ui/button'
import { ErrorState, LoadingState } from '../../../components/ui/page-state'
import { routineQueries } from '../api/routine-queries'
import { addDays, todayIn } from '../utils/zone-dates'
import { UpcomingDay } from './upcoming-day'

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
      <p className="mt-0.5 text-sm text-tide-600">
        The next {DAYS} days, facility time ({timeZone}).
      </p>
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
      {tasks.isSuccess && tasks.data.length === 0 && (
        <p className="mt-4 text-tide-700">
          {paused
            ? 'Paused: no tasks are planned until the routine is resumed.'
            : 'No tasks in the next two weeks. Check the rule, the targets and the active period.'}
        </p>
      )}
      {tasks.isSuccess && tasks.data.length > 0 && (
        <div className="mt-4 flex flex-col gap-4">
          {byDate(tasks.data).map(([date, dayTasks]) => (
            <UpcomingDay key={date} date={date} tasks={dayTasks} />
          ))}
        </div>
      )}
    </section>
  )
}
