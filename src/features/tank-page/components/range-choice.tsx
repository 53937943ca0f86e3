import { clsx } from 'clsx'
import { TREND_RANGES, type TrendRange } from '../api/tank-page-queries'

/** 7, 30 or 90 days back from now. */
export function RangeChoice({ value, onChange }: { value: TrendRange; onChange: (days: TrendRange) => void }) {
  return (
    <div role="group" aria-label="Range" className="inline-flex rounded-lg bg-white p-1 ring-1 ring-tide-200 print:hidden">
      {TREND_RANGES.map((days) => (
        <button
          key={days}
          type="button"
          aria-pressed={days === value}
          onClick={() => onChange(days)}
          className={clsx('min-h-11 rounded-md px-3 font-semibold', days === value ? 'bg-tide-700 text-white' : 'text-tide-700 hover:bg-tide-50')}
        >
          {days} days
        </button>
      ))}
    </div>
  )
}
