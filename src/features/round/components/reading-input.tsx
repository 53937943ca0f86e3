import { clsx } from 'clsx'
import { CircleAlert } from 'lucide-react'
import { forwardRef, useId } from 'react'
import { describeOkRange } from '#shared/readings/band'
import type { ReadingSpec } from '#shared/schemas/round'
import { checkTypedReading } from '#shared/readings/typed-reading'
import { bandReason } from '../utils/reading-value'
import { BandBadge } from '../../../components/ui/band-badge'

interface ReadingInputProps {
  spec: ReadingSpec
  value: string
  error?: string
  last: boolean
  onChange: (value: string) => void
  onEnter: () => void
  /** A fact to read beside the field, e.g. the fish on the register beside the mortality count. */
  aside?: string
}

/** One reading: big decimal field with its unit and ok range, and the band as the person types. */
export const ReadingInput = forwardRef<HTMLInputElement, ReadingInputProps>(function ReadingInput({ spec, value, error, last, onChange, onEnter, aside }, ref) {
  const id = useId()
  const check = checkTypedReading(value, spec)
  const range = describeOkRange(spec, spec.unit)
  const message = error ?? (check.state === 'invalid' ? check.message : undefined)
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="flex flex-wrap items-baseline justify-between gap-x-2 font-semibold text-tide-900">
        {spec.name}
        {range && <span className="text-sm font-normal text-tide-600">OK {range}</span>}
        {aside && <span className="w-full text-sm font-normal text-tide-700">{aside}</span>}
      </label>
      <div className={clsx('flex items-center rounded-xl border-2 bg-white focus-within:border-tide-500', message ? 'border-alarm-500' : 'border-tide-200')}>
        <input
          ref={ref}
          id={id}
          type="text"
          inputMode="decimal"
          enterKeyHint={last ? 'done' : 'next'}
          autoComplete="off"
          value={value}
          onChange={(e) => onChange(e.target.value)}
          onKeyDown={(e) => {
            if (e.key === 'Enter') {
              e.preventDefault()
              onEnter()
            }
          }}
          aria-invalid={message ? true : undefined}
          aria-describedby={`${id}-hint`}
          className="min-h-14 w-full min-w-0 rounded-xl bg-transparent px-3 text-2xl font-semibold tabular-nums outline-none"
        />
        <span className="shrink-0 px-3 text-lg text-tide-600">{spec.unit}</span>
      </div>
      <p id={`${id}-hint`} aria-live="polite" className="min-h-6 text-sm">
        {message ? (
          <span className="inline-flex items-center gap-1 font-semibold text-alarm-700">
            <CircleAlert aria-hidden className="size-4" /> {message}
          </span>
        ) : check.state === 'valid' ? (
          <span className="inline-flex flex-wrap items-center gap-2">
            <BandBadge band={check.band} ringed />
            <span className="text-tide-700">{bandReason(check.value, check.band, spec) ?? 'In range'}</span>
          </span>
        ) : null}
      </p>
    </div>
  )
})
