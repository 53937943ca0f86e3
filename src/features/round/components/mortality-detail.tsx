import { useQuery } from '@tanstack/react-query'
import { Microscope } from 'lucide-react'
import { useId } from 'react'
import { OTHER_CAUSE, UNKNOWN_CAUSE } from '#shared/schemas/stock'
import { stockQueries } from '../../../api/stock'
import type { MortalityDraft } from '../state/drafts'

interface Props {
  value: MortalityDraft
  errors: Record<string, string>
  onChange: (patch: Partial<MortalityDraft>) => void
}

const input = (error?: string) => `min-h-12 w-full rounded-xl border-2 bg-white px-3 text-base ${error ? 'border-alarm-500' : 'border-tide-200'}`

/**
 * Shown once fish are counted dead: the cause (the facility's list, unknown, or other in words)
 * and whether one is kept for necropsy. Offline without the list, unknown and other still work.
 */
export function MortalityDetail({ value, errors, onChange }: Props) {
  const id = useId()
  const causes = useQuery(stockQueries.settings()).data?.mortalityCauses ?? []
  const causeError = errors['mortality.cause']
  const textError = errors['mortality.causeText']
  return (
    <div className="flex flex-col gap-3 rounded-xl bg-tide-50 p-3">
      <div className="flex flex-col gap-1">
        <label htmlFor={`${id}-cause`} className="font-semibold text-tide-900">
          Cause of death
        </label>
        <select
          id={`${id}-cause`}
          value={value.cause}
          onChange={(e) => onChange({ cause: e.target.value })}
          aria-invalid={causeError ? true : undefined}
          aria-describedby={`${id}-cause-error`}
          className={input(causeError)}
        >
          <option value={UNKNOWN_CAUSE}>Unknown</option>
          {causes.map((c) => (
            <option key={c} value={c}>
              {c}
            </option>
          ))}
          <option value={OTHER_CAUSE}>Other (say what)</option>
        </select>
        {causeError && (
          <p id={`${id}-cause-error`} className="text-sm font-semibold text-alarm-700">
            {causeError}
          </p>
        )}
      </div>
      {value.cause === OTHER_CAUSE && (
        <div className="flex flex-col gap-1">
          <label htmlFor={`${id}-text`} className="font-semibold text-tide-900">
            What was the cause?
          </label>
          <input
            id={`${id}-text`}
            value={value.causeText}
            onChange={(e) => onChange({ causeText: e.target.value })}
            aria-invalid={textError ? true : undefined}
            aria-describedby={`${id}-text-error`}
            className={input(textError)}
          />
          {textError && (
            <p id={`${id}-text-error`} className="text-sm font-semibold text-alarm-700">
              {textError}
            </p>
          )}
        </div>
      )}
      <label className="flex min-h-12 items-center gap-3 font-semibold text-tide-900">
        <input type="checkbox" checked={value.necropsy} onChange={(e) => onChange({ necropsy: e.target.checked })} className="size-6 accent-tide-700" />
        <Microscope aria-hidden className="size-5 text-tide-600" /> Kept for necropsy
      </label>
    </div>
  )
}

/** "312 in this tank" beside the mortality field, from the register (kept for offline like the round). */
export function useTankCount(tankId: number | null, wanted: boolean): number | null {
  const onHand = useQuery({ ...stockQueries.onHand(), enabled: wanted && tankId !== null })
  // Loaded and absent means the register shows the tank empty: say 0 rather than nothing.
  return tankId === null || !onHand.data ? null : (onHand.data[String(tankId)] ?? 0)
}
