import { useState } from 'react'
import type { Task } from '#shared/schemas/task'
import { formatLocalDate, longWeekdayOf } from '../utils/zone-dates'
import { TaskStatusLabel } from '../../../components/ui/task-status-label'

// A routine over many tanks makes dozens of tasks a day; the first few show the pattern.
const FIRST_FEW = 8

export function UpcomingDay({ date, tasks }: { date: string; tasks: Task[] }) {
  const [all, setAll] = useState(false)
  const label = `${longWeekdayOf(date)} ${formatLocalDate(date)}`
  const shown = all ? tasks : tasks.slice(0, FIRST_FEW)
  return (
    <section aria-label={label}>
      <h3 className="flex items-baseline justify-between gap-2 border-b border-tide-200 pb-1 font-semibold text-tide-900">
        <span>{label}</span>
        <span className="text-sm font-normal text-tide-600">
          {tasks.length} {tasks.length === 1 ? 'task' : 'tasks'}
        </span>
      </h3>
      <ul className="divide-y divide-tide-100">
        {shown.map((t) => (
          <li key={t.id} className="grid grid-cols-[3.5rem_minmax(0,1fr)] items-center gap-x-3 gap-y-0.5 py-2 sm:grid-cols-[3.5rem_minmax(0,1fr)_auto]">
            <span className="font-semibold text-tide-900 tabular-nums">{t.localTime}</span>
            <span className="min-w-0 truncate text-tide-800">
              {t.targetLabel}
              {t.assigneeName && <span className="text-sm text-tide-600"> · {t.assigneeName}</span>}
            </span>
            <span className="col-start-2 sm:col-start-auto">
              <TaskStatusLabel status={t.status} />
            </span>
          </li>
        ))}
      </ul>
      {tasks.length > FIRST_FEW && (
        <button type="button" onClick={() => setAll((a) => !a)} className="min-h-11 font-semibold text-tide-700 hover:underline">
          {all ? 'Show fewer' : `Show all ${tasks.length} tasks`}
        </button>
      )}
    </section>
  )
}
