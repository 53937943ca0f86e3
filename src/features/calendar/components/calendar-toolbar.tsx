import { clsx } from 'clsx'
import { ChevronLeft, ChevronRight, Loader2 } from 'lucide-react'
import type { CalendarViewName } from '../utils/calendar-dates'

interface Props {
  title: string
  view: CalendarViewName
  loading: boolean
  onPrev: () => void
  onNext: () => void
  onToday: () => void
  onView: (view: CalendarViewName) => void
}

const buttonClass =
  'inline-flex min-h-11 items-center justify-center gap-1 rounded-lg bg-white px-3 font-semibold text-tide-800 ring-1 ring-tide-200 hover:bg-tide-50'

export function CalendarToolbar({ title, view, loading, onPrev, onNext, onToday, onView }: Props) {
  const unit = view === 'month' ? 'month' : 'week'
  return (
    <div className="flex flex-wrap items-center justify-between gap-3">
      <div className="flex items-center gap-1.5">
        <button type="button" onClick={onPrev} aria-label={`Previous ${unit}`} className={clsx(buttonClass, 'w-11 px-0')}>
          <ChevronLeft aria-hidden className="size-5" />
        </button>
        <button type="button" onClick={onNext} aria-label={`Next ${unit}`} className={clsx(buttonClass, 'w-11 px-0')}>
          <ChevronRight aria-hidden className="size-5" />
        </button>
        <button type="button" onClick={onToday} className={buttonClass}>
          Today
        </button>
        <h2 aria-live="polite" className="ml-2 flex items-center gap-2 text-xl font-bold text-tide-900">
          {title}
          {loading && <Loader2 aria-label="Loading" className="size-5 animate-spin text-tide-600" />}
        </h2>
      </div>
      <div role="group" aria-label="View" className="inline-flex rounded-lg bg-white p-0.5 ring-1 ring-tide-200">
        {(['month', 'week'] as const).map((v) => (
          <button
            key={v}
            type="button"
            aria-pressed={view === v}
            onClick={() => onView(v)}
            className={clsx('min-h-10 rounded-md px-4 font-semibold', view === v ? 'bg-tide-700 text-white' : 'text-tide-800 hover:bg-tide-50')}
          >
            {v === 'month' ? 'Month' : 'Week'}
          </button>
        ))}
      </div>
    </div>
  )
}
