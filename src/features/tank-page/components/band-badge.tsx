import { clsx } from 'clsx'
import { CircleCheck, OctagonAlert, TriangleAlert } from 'lucide-react'
import type { Band } from '#shared/schemas/parameter'

const BANDS = {
  ok: { label: 'OK', icon: CircleCheck, tone: 'bg-kelp-50 text-kelp-700' },
  watch: { label: 'Watch', icon: TriangleAlert, tone: 'bg-ember-50 text-ember-700' },
  critical: { label: 'Critical', icon: OctagonAlert, tone: 'bg-alarm-50 text-alarm-700' },
}

/** A band as icon + word, never colour alone. */
export function BandBadge({ band, prefix }: { band: Band; prefix?: string }) {
  const b = BANDS[band]
  return (
    <span className={clsx('inline-flex shrink-0 items-center gap-1 rounded-md px-1.5 py-0.5 text-sm font-bold', b.tone)}>
      <b.icon aria-hidden className="size-4" /> {prefix ? `${prefix}: ${b.label}` : b.label}
    </span>
  )
}
