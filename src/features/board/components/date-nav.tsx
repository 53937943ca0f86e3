import { ChevronLeft, ChevronRight } from 'lucide-react'
import { Link, useNavigate } from 'react-router-dom'
import { addDays, ISO_DATE } from '../utils/board-dates'

interface Props {
  date: string
  today: string
  hrefFor: (date: string) => string
}

const stepClass = 'inline-flex size-11 items-center justify-center rounded-lg bg-white text-tide-800 ring-1 ring-tide-200 hover:bg-tide-50'

export function DateNav({ date, today, hrefFor }: Props) {
  const navigate = useNavigate()
  return (
    <div className="flex items-end gap-1.5">
      <Link to={hrefFor(addDays(date, -1))} aria-label="Previous day" className={stepClass}>
        <ChevronLeft aria-hidden className="size-5" />
      </Link>
      <div className="flex flex-col gap-1">
        <label htmlFor="board-date" className="text-sm font-semibold text-tide-800">
          Board date
        </label>
        <input
          id="board-date"
          type="date"
          value={date}
          required
          onChange={(e) => ISO_DATE.test(e.target.value) && navigate(hrefFor(e.target.value))}
          className="min-h-11 rounded-lg border border-tide-200 bg-white px-3"
        />
      </div>
      <Link to={hrefFor(addDays(date, 1))} aria-label="Next day" className={stepClass}>
        <ChevronRight aria-hidden className="size-5" />
      </Link>
      {date !== today && (
        <Link to={hrefFor(today)} className="inline-flex min-h-11 items-center rounded-lg px-3 font-semibold text-tide-700 underline hover:bg-tide-50">
          Today
        </Link>
      )}
    </div>
  )
}
