import { clsx } from 'clsx'
import { AlarmClock, Ban, CalendarClock, CircleCheck, CircleDashed, CirclePause, CircleX, type LucideIcon } from 'lucide-react'
import type { TaskStatus } from '#shared/schemas/task'

export const STATUS_LOOK: Record<TaskStatus, { label: string; icon: LucideIcon; tone: string }> = {
  planned: { label: 'Planned', icon: CalendarClock, tone: 'text-tide-600' },
  open: { label: 'Open', icon: CircleDashed, tone: 'text-tide-800' },
  overdue: { label: 'Overdue', icon: AlarmClock, tone: 'text-ember-700' },
  missed: { label: 'Missed', icon: CircleX, tone: 'text-alarm-700' },
  done: { label: 'Done', icon: CircleCheck, tone: 'text-kelp-700' },
  skipped: { label: 'Skipped', icon: Ban, tone: 'text-tide-600' },
  held: { label: 'Held', icon: CirclePause, tone: 'text-tide-700' },
}

/** A task status as icon and words, the same on every screen. */
export function TaskStatusLabel({ status }: { status: TaskStatus }) {
  const s = STATUS_LOOK[status]
  return (
    <span className={clsx('inline-flex shrink-0 items-center gap-1 text-sm font-semibold', s.tone)}>
      <s.icon aria-hidden className="size-4" /> {s.label}
    </span>
  )
}
