import { clsx } from 'clsx'
import { ChevronLeft, ChevronRight } from 'lucide-react'
import { Button } from '../../../components/ui/button'
import { addDays, dayMonth } from '../utils/roster-dates'

/** Move by the visible span, jump back to this week, or switch between one and two weeks. */
export function RosterToolbar({
  from,
  days,
  thisMonday,
  onChange,
}: {
  from: string
  days: 7 | 14
  thisMonday: string
  onChange: (from: string, days: 7 | 14) => void
}) {
  const spanButton = (n: 7 | 14, label: string) => (
    <button
      type="button"
      aria-pressed={days === n}
      onClick={() => onChange(from, n)}
      className={clsx('min-h-11 px-4 font-semibold', days === n ? 'bg-tide-700 text-white' : 'bg-white text-tide-800 hover:bg-tide-50')}
    >
      {label}
    </button>
  )
  return (
    <div className="flex flex-wrap items-center gap-2">
      <Button type="button" variant="secondary" aria-label="Earlier" onClick={() => onChange(addDays(from, -days), days)}>
        <ChevronLeft aria-hidden className="size-5" />
      </Button>
      <p className="min-w-40 text-center font-semibold text-tide-900" aria-live="polite">
        {dayMonth(from)} – {dayMonth(addDays(from, days - 1))}
      </p>
      <Button type="button" variant="secondary" aria-label="Later" onClick={() => onChange(addDays(from, days), days)}>
        <ChevronRight aria-hidden className="size-5" />
      </Button>
      <Button type="button" variant="ghost" disabled={from === thisMonday} onClick={() => onChange(thisMonday, days)}>
        This week
      </Button>
      <div role="group" aria-label="Days shown" className="flex overflow-hidden rounded-lg ring-1 ring-tide-200">
        {spanButton(7, 'Week')}
        {spanButton(14, 'Fortnight')}
      </div>
    </div>
  )
}
