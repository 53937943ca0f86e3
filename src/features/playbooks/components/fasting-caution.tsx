import { Info } from 'lucide-react'

/** Shown wherever a fasting time is suggested or set. */
export function FastingCaution() {
  return (
    <p className="flex items-start gap-2 rounded-lg bg-tide-50 p-3 text-sm text-tide-800">
      <Info aria-hidden className="mt-0.5 size-4 shrink-0 text-tide-600" />
      <span>
        Common practice is 24 h for warm-water juveniles; follow your veterinarian and permit. Longer fasts are not suitable for cannibalistic species, and any
        withdrawal period after medicated feed still applies.
      </span>
    </p>
  )
}
