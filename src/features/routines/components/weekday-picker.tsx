import type { Weekday } from '#shared/schedule/build-rule'
import { WEEKDAYS } from '../utils/rule-spec'

export function WeekdayPicker({ value, onChange }: { value: Weekday[]; onChange: (days: Weekday[]) => void }) {
  const chosen = new Set(value)
  return (
    <fieldset className="flex flex-col gap-1">
      <legend className="mb-1 text-sm font-semibold text-tide-800">On these days</legend>
      <div className="grid grid-cols-7 gap-1">
        {WEEKDAYS.map((d) => (
          <label key={d.code} className="relative">
            <input
              type="checkbox"
              aria-label={d.long}
              checked={chosen.has(d.code)}
              onChange={(e) => onChange(e.target.checked ? [...value, d.code] : value.filter((v) => v !== d.code))}
              className="peer absolute inset-0 size-full cursor-pointer opacity-0"
            />
            <span
              aria-hidden
              className="flex min-h-11 items-center justify-center rounded-lg border border-tide-200 bg-white text-sm font-semibold text-tide-700 peer-checked:border-tide-700 peer-checked:bg-tide-700 peer-checked:text-white peer-focus-visible:outline-3 peer-focus-visible:outline-offset-2 peer-focus-visible:outline-tide-500"
            >
              {d.short}
            </span>
          </label>
        ))}
      </div>
    </fieldset>
  )
}
