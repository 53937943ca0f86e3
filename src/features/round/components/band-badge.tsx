import { clsx } from 'clsx'
import { CircleCheck, OctagonAlert, TriangleAlert } from 'lucide-react'
import type { Band } from '#shared/schemas/parameter'

const BANDS = {
  ok: { label: 'OK', icon: CircleCheck, className: 'bg-kelp-50 text-kelp-700 ring-kelp-500/30' },
  watch: { label: 'Watch', icon: TriangleAlert, className: 'bg-ember-50 text-ember-700 ring-ember-500/40' },
  critical: { label: 'Critical', icon: OctagonAlert, className: 'bg-alarm-50 text-alarm-700 ring-alarm-500/40' },
}

/** A band as icon + word; `prefix` turns it into e.g. "Flag: Critical". */
export function BandBadge({ band, prefix, className }: { band: Band; prefix?: string; className?: string }) {
  const { label, icon: Icon, className: tone } = BANDS[band]
  return (
    <span className={clsx('inline-flex items-center gap-1 rounded-md px-1.5 py-0.5 text-sm font-bold ring-1', tone, className)}>
      <Icon aria-hidden className="size-4" /> {prefix ? `${prefix}: ${label}` : label}
    </span>
  )
}
