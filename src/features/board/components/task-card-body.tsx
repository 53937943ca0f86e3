import { clsx } from 'clsx'
import { CirclePause } from 'lucide-react'
import { memo } from 'react'
import type { BoardCard } from '#shared/schemas/board'
import { FlagLabel, WelfareLabel } from './flag-label'
import { TaskStatusLabel } from '../../../components/ui/task-status-label'

/** What a card says about its task; shared by the card and the preview that follows a drag. Redrawn only when the task changes. */
export const TaskCardBody = memo(function TaskCardBody({ task, cornerTaken = false }: { task: BoardCard; cornerTaken?: boolean }) {
  const flagged = task.flag === 'watch' || task.flag === 'critical'
  return (
    <div className="flex min-w-0 flex-1 flex-col gap-0.5">
      <p className={clsx('flex flex-wrap items-center gap-x-2', cornerTaken && 'pr-8')}>
        <span className="font-bold tabular-nums text-tide-900">{task.localTime}</span>
        <TaskStatusLabel status={task.status} />
      </p>
      <p className="leading-snug font-semibold text-tide-950">{task.title}</p>
      <p className="truncate text-sm text-tide-700" title={task.targetLabel}>
        {task.targetLabel}
      </p>
      {(flagged || task.priority === 'welfare_critical') && (
        <p className="mt-0.5 flex flex-wrap items-center gap-x-2 gap-y-1">
          {flagged && <FlagLabel band={task.flag as 'watch' | 'critical'} />}
          {task.priority === 'welfare_critical' && <WelfareLabel />}
        </p>
      )}
      {task.status === 'held' && (
        <p className="flex items-center gap-1 text-sm text-tide-800">
          <CirclePause aria-hidden className="size-4 shrink-0" /> Held: {task.heldReason ?? 'fasting window'}
        </p>
      )}
    </div>
  )
})
