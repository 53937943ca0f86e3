import { WEEKDAYS } from '#shared/schemas/roster'

type Weekday = (typeof WEEKDAYS)[number]
const NAMES: Record<Weekday, string> = { MO: 'Monday', TU: 'Tuesday', WE: 'Wednesday', TH: 'Thursday', FR: 'Friday', SA: 'Saturday', SU: 'Sunday' }

export function WeekdayPicker({ value, onChange, error }: { value: Weekday[]; onChange: (days: Weekday[]) => void; error?: string }) {
  const chosen = new Set(value)
  return (
    <fieldset className="flex flex-col gap-1">
      <legend className="mb-1 text-sm font-semibold text-tide-800">On these days</legend>
      <div className="grid grid-cols-7 gap-1">
        {WEEKDAYS.map((d) => (
          <label key={d} className="relative">
            <input
              type="checkbox"
              aria-label={NAMES[d]}
              checked={chosen.has(d)}
              onChange={(e) => onChange(e.target.checked ? WEEKDAYS.filter((w) => w === d || chosen.has(w)) : value.filter((v) => v !== d))}
              className="peer absolute inset-0 size-full cursor-pointer opacity-0"
            />
            <span
              aria-hidden
              className="flex min-h-11 items-center justify-center rounded-lg border border-tide-200 bg-white text-sm font-semibold text-tide-700 peer-checked:border-tide-700 peer-checked:bg-tide-700 peer-checked:text-white peer-focus-visible:outline-3 peer-focus-visible:outline-offset-2 peer-focus-visible:outline-tide-500"
            >
              {NAMES[d].slice(0, 2)}
            </span>
          </label>
        ))}
      </div>
      {error && <p className="text-sm font-semibold text-alarm-700">{error}</p>}
    </fieldset>
  )
}
