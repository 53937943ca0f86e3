import { Clock, Inbox, UserX } from 'lucide-react'
import { memo } from 'react'
import type { BoardColumnPerson } from '#shared/schemas/board'
import { minutesText } from '../utils/task-text'

interface Props {
  headingId: string
  /** Null for the Unassigned column. */
  person: BoardColumnPerson | null
  taskCount: number
  plannedMinutes: number
}

/** Memoised: the column around it redraws whenever a drag starts, changes target or ends. */
export const ColumnHeader = memo(function ColumnHeader({ headingId, person, taskCount, plannedMinutes }: Props) {
  return (
    <header className="flex flex-col gap-0.5 border-b border-tide-200 px-3 py-2">
      <h2 id={headingId} className="flex items-center gap-1.5 font-bold text-tide-900">
        {person === null && <Inbox aria-hidden className="size-4 shrink-0" />}
        <span className="truncate">{person?.name ?? 'Unassigned'}</span>
      </h2>
      {person &&
        (person.shifts.length > 0 ? (
          <p className="flex items-center gap-1 text-sm text-tide-700">
            <Clock aria-hidden className="size-4 shrink-0" />
            {person.shifts.map((s) => `${s.start}–${s.end}`).join(', ')}
          </p>
        ) : (
          <p className="flex items-center gap-1 text-sm font-semibold text-ember-700">
            <UserX aria-hidden className="size-4 shrink-0" /> Not on shift
          </p>
        ))}
      <p className="text-sm text-tide-600">
        {taskCount === 1 ? '1 task' : `${taskCount} tasks`}
        {taskCount > 0 && ` · ${minutesText(plannedMinutes)} planned`}
      </p>
    </header>
  )
})
