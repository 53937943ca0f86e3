import { CirclePause } from 'lucide-react'
import type { Task } from '#shared/schemas/task'
import { FlagLabel, WelfareLabel } from './flag-label'
import { StatusLabel } from './status-label'

/** What a card says about its task; shared by the card and the preview that follows a drag. */
export function TaskCardBody({ task }: { task: Task }) {
  return (
    <div className="flex min-w-0 flex-1 flex-col gap-0.5">
      <p className="flex items-baseline gap-2 leading-snug">
        <span className="shrink-0 font-bold tabular-nums text-tide-900">{task.localTime}</span>
        <span className="min-w-0 font-semibold break-words text-tide-950">{task.title}</span>
      </p>
      <p className="truncate text-sm text-tide-700" title={task.targetLabel}>{task.targetLabel}</p>
      <p className="mt-0.5 flex flex-wrap items-center gap-x-2 gap-y-1">
        <StatusLabel status={task.status} />
        {task.flag && task.flag !== 'ok' && <FlagLabel band={task.flag} />}
        {task.priority === 'welfare_critical' && <WelfareLabel />}
      </p>
      {task.status === 'held' && (
        <p className="flex items-center gap-1 text-sm text-tide-800">
          <CirclePause aria-hidden className="size-4 shrink-0" /> Held: {task.heldReason ?? 'fasting window'}
        </p>
      )}
    </div>
  )
}
