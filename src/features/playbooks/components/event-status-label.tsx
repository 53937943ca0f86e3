import { clsx } from 'clsx'
import { Ban, CalendarClock, CircleCheck, type LucideIcon } from 'lucide-react'
import type { FacilityEvent } from '#shared/schemas/playbook'

const STATUS: Record<FacilityEvent['status'], { label: string; icon: LucideIcon; tone: string }> = {
  planned: { label: 'Planned', icon: CalendarClock, tone: 'text-tide-800' },
  ended: { label: 'Ended', icon: CircleCheck, tone: 'text-kelp-700' },
  cancelled: { label: 'Cancelled', icon: Ban, tone: 'text-tide-600' },
}

export function EventStatusLabel({ status }: { status: FacilityEvent['status'] }) {
  const s = STATUS[status]
  return (
    <span className={clsx('inline-flex items-center gap-1 text-sm font-semibold', s.tone)}>
      <s.icon aria-hidden className="size-4" /> {s.label}
    </span>
  )
}
