import { ChevronRight } from 'lucide-react'
import { Link } from 'react-router-dom'
import type { Task } from '#shared/schemas/task'
import { formatLocalDay } from '../utils/format'
import { BandBadge } from '../../../components/ui/band-badge'
import { TaskStatusLabel } from '../../../components/ui/task-status-label'

/** The tank's latest tasks, newest first, each opening its own record. */
export function RecentTasks({ tasks }: { tasks: Task[] }) {
  if (tasks.length === 0) return <p className="rounded-xl border border-dashed border-tide-300 bg-white p-4 text-tide-700">No tasks for this tank yet.</p>
  return (
    <ul aria-label="Recent tasks" className="divide-y divide-tide-100 overflow-hidden rounded-xl border border-tide-200 bg-white">
      {tasks.map((t) => (
        <li key={t.id}>
          <Link to={`/tasks/${t.id}`} className="flex min-h-11 items-center gap-3 px-3 py-2 hover:bg-tide-50 md:py-1.5">
            <span className="flex min-w-0 flex-1 flex-col gap-0.5">
              <span className="font-semibold text-tide-900">{t.title}</span>
              <span className="flex flex-wrap items-center gap-x-3 gap-y-1 text-sm">
                <span className="tabular-nums text-tide-700">
                  {formatLocalDay(t.localDate)}, {t.localTime}
                </span>
                <TaskStatusLabel status={t.status} />
                {t.flag && <BandBadge band={t.flag} prefix="Flag" />}
                {t.completedByName && <span className="text-tide-700">by {t.completedByName}</span>}
              </span>
            </span>
            <ChevronRight aria-hidden className="size-4 shrink-0 text-tide-500 print:hidden" />
          </Link>
        </li>
      ))}
    </ul>
  )
}
