import { Archive, Fish, ShieldAlert, Truck, type LucideIcon } from 'lucide-react'
import { clsx } from 'clsx'
import type { Batch } from '#shared/schemas/facility'

export const BATCH_STATUS_LABELS: Record<Batch['status'], string> = {
  quarantine: 'In quarantine',
  active: 'Active',
  dispatched: 'Dispatched',
  ended: 'Ended',
}

const LOOK: Record<Batch['status'], { icon: LucideIcon; className: string }> = {
  quarantine: { icon: ShieldAlert, className: 'bg-tide-900 text-white' },
  active: { icon: Fish, className: 'bg-kelp-50 text-kelp-700' },
  dispatched: { icon: Truck, className: 'bg-tide-100 text-tide-800' },
  ended: { icon: Archive, className: 'bg-tide-50 text-tide-600' },
}

export function BatchStatus({ status }: { status: Batch['status'] }) {
  const { icon: Icon, className } = LOOK[status]
  return (
    <span className={clsx('inline-flex items-center gap-1 whitespace-nowrap rounded-full px-2 py-0.5 text-xs font-semibold', className)}>
      <Icon aria-hidden className="size-3.5" /> {BATCH_STATUS_LABELS[status]}
    </span>
  )
}
