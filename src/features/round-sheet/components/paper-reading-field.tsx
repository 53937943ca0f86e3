import { useId } from 'react'
import { describeOkRange } from '#shared/readings/band'
import type { ReadingSpec } from '#shared/schemas/round'

interface PaperReadingFieldProps {
  spec: ReadingSpec
  value: string
  error?: string
  onChange: (value: string) => void
}

/** One reading copied from paper: its name and unit, the ok range as a hint, the server's or our error under it. */
export function PaperReadingField({ spec, value, error, onChange }: PaperReadingFieldProps) {
  const id = useId()
  const range = describeOkRange(spec, spec.unit)
  return (
    <div className="flex min-w-0 flex-col gap-1">
      <label htmlFor={id} className="text-sm font-semibold text-tide-800">
        {spec.name} ({spec.unit})
      </label>
      <input
        id={id}
        type="text"
        inputMode="decimal"
        autoComplete="off"
        value={value}
        onChange={(e) => onChange(e.target.value)}
        aria-invalid={error ? true : undefined}
        aria-describedby={`${id}-hint`}
        className={`min-h-11 rounded-lg border bg-white px-3 text-base tabular-nums ${error ? 'border-alarm-500' : 'border-tide-200'}`}
      />
      <p id={`${id}-hint`} className={error ? 'text-sm font-semibold text-alarm-700' : 'text-sm text-tide-600'}>
        {error ?? (range ? `ok ${range}` : 'no limit set')}
      </p>
    </div>
  )
}
