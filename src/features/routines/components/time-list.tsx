import { Plus, X } from 'lucide-react'

export function TimeList({ times, onChange }: { times: string[]; onChange: (times: string[]) => void }) {
  const set = (index: number, time: string) => onChange(times.map((t, i) => (i === index ? time : t)))
  return (
    <fieldset className="flex flex-col gap-1">
      <legend className="mb-1 text-sm font-semibold text-tide-800">At these times (facility time)</legend>
      <ul className="flex flex-wrap gap-2">
        {times.map((time, index) => (
          <li key={index} className="flex items-center gap-1">
            <input
              type="time"
              aria-label={`Time of day ${index + 1}`}
              value={time}
              onChange={(e) => set(index, e.target.value)}
              className="min-h-11 rounded-lg border border-tide-200 bg-white px-3 text-base"
            />
            {times.length > 1 && (
              <button
                type="button"
                aria-label={`Remove time ${index + 1}`}
                onClick={() => onChange(times.filter((_, i) => i !== index))}
                className="flex size-11 items-center justify-center rounded-lg text-tide-600 hover:bg-tide-100"
              >
                <X aria-hidden className="size-5" />
              </button>
            )}
          </li>
        ))}
        <li>
          <button
            type="button"
            onClick={() => onChange([...times, ''])}
            className="inline-flex min-h-11 items-center gap-1 rounded-lg px-3 font-semibold text-tide-700 hover:bg-tide-100"
          >
            <Plus aria-hidden className="size-4" /> Add a time
          </button>
        </li>
      </ul>
    </fieldset>
  )
}
