import { Calculator } from 'lucide-react'
import { deriveReadings } from '#shared/readings/derive'
import type { ReadingSpec } from '#shared/schemas/round'
import { DERIVED_NAMES as DERIVED } from '../utils/derived-names'
import { checkTypedReading } from '#shared/readings/typed-reading'

/** Values Roundtide works out from what was typed (DO % saturation, NH3); the server bands them on Done. */
export function DerivedReadings({ specs, raw, salinitySetpoint }: { specs: ReadingSpec[]; raw: Record<string, string>; salinitySetpoint: number | null }) {
  const values: Record<string, number> = {}
  for (const spec of specs) {
    const check = checkTypedReading(raw[spec.key] ?? '', spec)
    if (check.state === 'valid') values[spec.key] = check.value
  }
  const derived = deriveReadings(values, salinitySetpoint)
  const entries = Object.entries(derived.values)
  if (!entries.length && !derived.notes.length) return null
  return (
    <div aria-live="polite" className="rounded-xl bg-tide-100/70 px-3 py-2 text-tide-800">
      {entries.map(([key, value]) => (
        <p key={key} className="flex items-center gap-2">
          <Calculator aria-hidden className="size-4 shrink-0 text-tide-600" />
          <span>{DERIVED[key]?.name ?? key}</span>
          <span className="ml-auto font-bold tabular-nums">
            {value} {DERIVED[key]?.unit}
          </span>
        </p>
      ))}
      {derived.notes.map((note) => (
        <p key={note} className="text-sm text-tide-700">
          {note}
        </p>
      ))}
    </div>
  )
}
