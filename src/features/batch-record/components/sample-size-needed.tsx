import { clsx } from 'clsx'
import { CircleCheck, Info } from 'lucide-react'

export const ALLOWED_ERRORS = [5, 10, 15] as const

/** "Sample size needed for ±E % at 95 %", from this sample's own spread. */
export function SampleSizeNeeded({
  n,
  needed,
  allowedErrorPct,
  onChange,
}: {
  n: number
  needed: number | null
  allowedErrorPct: number
  onChange: (pct: number) => void
}) {
  const enough = needed !== null && n >= needed
  return (
    <div className="flex flex-col gap-2 rounded-lg border border-tide-200 p-3">
      <fieldset className="flex flex-col gap-2">
        <legend className="text-sm font-semibold text-tide-800">Mean within, at 95 % confidence</legend>
        <div className="flex gap-2">
          {ALLOWED_ERRORS.map((pct) => (
            <label
              key={pct}
              className={clsx(
                'flex min-h-11 flex-1 cursor-pointer items-center justify-center rounded-lg border px-3 font-semibold has-[:focus-visible]:ring-2 has-[:focus-visible]:ring-tide-500 has-[:focus-visible]:ring-offset-2 sm:flex-none',
                pct === allowedErrorPct ? 'border-tide-700 bg-tide-700 text-white' : 'border-tide-200 text-tide-800',
              )}
            >
              <input type="radio" name="allowed-error" className="sr-only" checked={pct === allowedErrorPct} onChange={() => onChange(pct)} />±{pct} %
            </label>
          ))}
        </div>
      </fieldset>
      <p className="flex items-start gap-2 text-tide-900" data-testid="sample-size">
        {enough ? (
          <CircleCheck aria-hidden className="mt-0.5 size-5 shrink-0 text-kelp-700" />
        ) : (
          <Info aria-hidden className="mt-0.5 size-5 shrink-0 text-tide-600" />
        )}
        {needed === null
          ? 'Sample size needed appears once two different weights are in.'
          : `Sample size needed for ±${allowedErrorPct} % at 95 %: ${needed} fish (${enough ? 'reached' : `${needed - n} more`}).`}
      </p>
      <p className="text-sm text-tide-600">Worked out from this sample’s CV, so it settles as more fish are weighed.</p>
    </div>
  )
}
