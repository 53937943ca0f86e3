import { clsx } from 'clsx'
import { Ban, Circle, CircleAlert, CircleCheck, CircleDot, CirclePause, Clock, type LucideIcon } from 'lucide-react'
import type { TaskStatus } from '#shared/schemas/task'

const STATUS: Record<TaskStatus, { label: string; icon: LucideIcon; tone: string }> = {
  planned: { label: 'Planned', icon: Circle, tone: 'text-tide-600' },
  open: { label: 'Open', icon: CircleDot, tone: 'text-tide-800' },
  overdue: { label: 'Overdue', icon: Clock, tone: 'text-ember-700' },
  missed: { label: 'Missed', icon: CircleAlert, tone: 'text-alarm-700' },
  done: { label: 'Done', icon: CircleCheck, tone: 'text-kelp-700' },
  skipped: { label: 'Skipped', icon: Ban, tone: 'text-tide-600' },
  held: { label: 'Held', icon: CirclePause, tone: 'text-tide-700' },
}

export function TaskStatusLabel({ status }: { status: TaskStatus }) {
  const s = STATUS[status]
  return (
    <span className={clsx('inline-flex items-center gap-1 text-sm font-semibold', s.tone)}>
      <s.icon aria-hidden className="size-4" /> {s.label}
    </span>
  )
}
