import { HeartPulse } from 'lucide-react'
import type { Routine } from '#shared/schemas/routine'

/** Only welfare-critical work is marked; routine priority is the unmarked default. */
export function PriorityLabel({ priority }: { priority: Routine['priority'] }) {
  if (priority !== 'welfare_critical') return null
  return (
    <span className="inline-flex items-center gap-1 rounded-full bg-alarm-50 px-2 py-0.5 text-sm font-semibold text-alarm-700">
      <HeartPulse aria-hidden className="size-4" /> Welfare-critical
    </span>
  )
}
