import { CalendarX, Plus, X } from 'lucide-react'
import { useState } from 'react'
import { useController } from 'react-hook-form'
import type { RoutineInput } from '#shared/schemas/routine'
import { formatLocalDate, weekdayOf } from '../utils/zone-dates'

export function SkipDatesField() {
  const { field, fieldState } = useController<RoutineInput, 'skipDates'>({ name: 'skipDates' })
  const dates = field.value ?? []
  const [draft, setDraft] = useState('')
  const add = () => {
    if (!draft || dates.includes(draft)) return
    field.onChange([...dates, draft].sort())
    setDraft('')
  }
  return (
    <div className="flex flex-col gap-2 sm:col-span-2">
      <label htmlFor="routine-skip-date" className="text-sm font-semibold text-tide-800">
        Skip dates
      </label>
      <p className="-mt-1 text-sm text-tide-600">No tasks on these days, e.g. a shutdown or a stocking day.</p>
      <div className="flex gap-2">
        <input
          id="routine-skip-date"
          type="date"
          value={draft}
          onChange={(e) => setDraft(e.target.value)}
          onKeyDown={(e) => {
            if (e.key === 'Enter') {
              e.preventDefault()
              add()
            }
          }}
          className="min-h-11 rounded-lg border border-tide-200 bg-white px-3 text-base"
        />
        <button
          type="button"
          onClick={add}
          disabled={!draft}
          className="inline-flex min-h-11 items-center gap-1 rounded-lg px-3 font-semibold text-tide-700 hover:bg-tide-100 disabled:text-tide-300"
        >
          <Plus aria-hidden className="size-4" /> Add
        </button>
      </div>
      {dates.length > 0 && (
        <ul aria-label="Skipped dates" className="flex flex-wrap gap-2">
          {dates.map((d) => (
            <li key={d} className="inline-flex items-center gap-1 rounded-full bg-tide-100 pl-3 text-sm text-tide-900">
              <CalendarX aria-hidden className="size-4 text-tide-600" /> {weekdayOf(d)} {formatLocalDate(d)}
              <button
                type="button"
                aria-label={`Stop skipping ${d}`}
                onClick={() => field.onChange(dates.filter((x) => x !== d))}
                className="flex size-11 items-center justify-center rounded-full hover:bg-tide-200"
              >
                <X aria-hidden className="size-4" />
              </button>
            </li>
          ))}
        </ul>
      )}
      {fieldState.error && <p className="text-sm font-semibold text-alarm-700">{fieldState.error.message ?? 'Check the dates'}</p>}
    </div>
  )
}
