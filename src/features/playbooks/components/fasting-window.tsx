import { UtensilsCrossed } from 'lucide-react'
import { formatInstant } from '../utils/zone-format'

/** The window in which the event's tanks get no feeds: icon and words, never colour alone. */
export function FastingWindow({ from, to, zone }: { from: string | null; to: string | null; zone: string }) {
  if (!from || !to) return null
  return (
    <p className="flex items-start gap-2 text-sm text-tide-800">
      <UtensilsCrossed aria-hidden className="mt-0.5 size-4 shrink-0 text-tide-600" />
      <span>
        Feeding held from {formatInstant(from, zone)} to {formatInstant(to, zone)}
      </span>
    </p>
  )
}
