import { clsx } from 'clsx'
import type { TaskStatus } from '#shared/schemas/task'
import { STATUS_LOOK } from '../utils/status-look'

export function StatusLabel({ status }: { status: TaskStatus }) {
  const s = STATUS_LOOK[status]
  return (
    <span className={clsx('inline-flex items-center gap-1 text-sm font-semibold', s.tone)}>
      <s.icon aria-hidden className="size-4" /> {s.label}
    </span>
  )
}
