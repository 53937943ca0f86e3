import { clsx } from 'clsx'
import type { TaskStatus } from '#shared/schemas/task'
import { STATUS_LOOK } from '../../../components/ui/task-status-label'

// Beside a tank at 7 a.m. late work must stand out from across the room, so the Round fills it.
const EMPHASIS: Partial<Record<TaskStatus, string>> = {
  overdue: 'bg-ember-100 px-1.5 font-bold',
  missed: 'bg-alarm-100 px-1.5 font-bold',
}

/** The app's status words and icons, with late work filled in. */
export function TaskStatusBadge({ status }: { status: TaskStatus }) {
  const { label, icon: Icon, tone } = STATUS_LOOK[status]
  return (
    <span className={clsx('inline-flex items-center gap-1 rounded-md py-0.5 text-sm font-semibold', tone, EMPHASIS[status])}>
      <Icon aria-hidden className="size-4" /> {label}
    </span>
  )
}
