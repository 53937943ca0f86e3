import { clsx } from 'clsx'
import { CircleCheck, OctagonAlert, TriangleAlert, type LucideIcon } from 'lucide-react'
import type { Band } from '#shared/schemas/parameter'

export const BAND_LOOK: Record<Band, { label: string; icon: LucideIcon; tone: string; text: string; ring: string }> = {
  ok: { label: 'OK', icon: CircleCheck, tone: 'bg-kelp-50 text-kelp-700', text: 'text-kelp-700', ring: 'ring-kelp-500/30' },
  watch: { label: 'Watch', icon: TriangleAlert, tone: 'bg-ember-50 text-ember-700', text: 'text-ember-700', ring: 'ring-ember-500/40' },
  critical: { label: 'Critical', icon: OctagonAlert, tone: 'bg-alarm-50 text-alarm-700', text: 'text-alarm-700', ring: 'ring-alarm-500/40' },
}

/** A band as icon + word, never colour alone; `prefix` makes e.g. "Flag: Critical", `ringed` adds an outline (the round). */
export function BandBadge({ band, prefix, ringed, className }: { band: Band; prefix?: string; ringed?: boolean; className?: string }) {
  const b = BAND_LOOK[band]
  return (
    <span
      className={clsx('inline-flex shrink-0 items-center gap-1 rounded-md px-1.5 py-0.5 text-sm font-bold', b.tone, ringed && ['ring-1', b.ring], className)}
    >
      <b.icon aria-hidden className="size-4" /> {prefix ? `${prefix}: ${b.label}` : b.label}
    </span>
  )
}
