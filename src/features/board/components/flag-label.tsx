import { Eye, HeartPulse, Siren } from 'lucide-react'

/** A completed task's readings fell outside the ok band. */
export function FlagLabel({ band }: { band: 'watch' | 'critical' }) {
  return band === 'critical' ? (
    <span className="inline-flex items-center gap-1 rounded bg-alarm-600 px-1.5 text-sm font-bold text-white">
      <Siren aria-hidden className="size-4" /> Flag: critical
    </span>
  ) : (
    <span className="inline-flex items-center gap-1 rounded bg-ember-100 px-1.5 text-sm font-bold text-ember-700">
      <Eye aria-hidden className="size-4" /> Flag: watch
    </span>
  )
}

export function WelfareLabel() {
  return (
    <span className="inline-flex items-center gap-1 text-sm font-semibold text-tide-800">
      <HeartPulse aria-hidden className="size-4" /> Welfare-critical
    </span>
  )
}
