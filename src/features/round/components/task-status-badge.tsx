import { clsx } from 'clsx'
import { AlarmClock, Ban, CalendarClock, CircleCheck, CircleDashed, CirclePause, CircleX, type LucideIcon } from 'lucide-react'
import type { TaskStatus } from '#shared/schemas/task'

const STATUS: Record<TaskStatus, { label: string; icon: LucideIcon; className: string }> = {
  planned: { label: 'Planned', icon: CalendarClock, className: 'text-tide-600' },
  open: { label: 'Open', icon: CircleDashed, className: 'text-tide-700' },
  overdue: { label: 'Overdue', icon: AlarmClock, className: 'bg-ember-100 px-1.5 text-ember-700 font-bold' },
  missed: { label: 'Missed', icon: CircleX, className: 'bg-alarm-100 px-1.5 text-alarm-700 font-bold' },
  done: { label: 'Done', icon: CircleCheck, className: 'text-kelp-700' },
  skipped: { label: "Couldn't do", icon: Ban, className: 'text-tide-700' },
  held: { label: 'On hold', icon: CirclePause, className: 'text-tide-600' },
}

export function TaskStatusBadge({ status }: { status: TaskStatus }) {
  const { label, icon: Icon, className } = STATUS[status]
  return (
    <span className={clsx('inline-flex items-center gap-1 rounded-md py-0.5 text-sm font-semibold', className)}>
      <Icon aria-hidden className="size-4" /> {label}
    </span>
  )
}
