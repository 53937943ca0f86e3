import { useId } from 'react'
import type { PaperDraft } from '../utils/paper-form'

interface PaperPersonTimeProps {
  draft: PaperDraft
  people: Array<{ id: number; name: string }>
  errors: Record<string, string>
  onChange: (change: Partial<PaperDraft>) => void
}

/** The time written on paper and who wrote it. */
export function PaperPersonTime({ draft, people, errors, onChange }: PaperPersonTimeProps) {
  const id = useId()
  const input = (error?: string) => `min-h-11 rounded-lg border bg-white px-3 text-base ${error ? 'border-alarm-500' : 'border-tide-200'}`
  return (
    <div className="flex flex-wrap gap-3">
      <div className="flex w-36 flex-col gap-1">
        <label htmlFor={`${id}-time`} className="text-sm font-semibold text-tide-800">
          Time on paper
        </label>
        <input
          id={`${id}-time`}
          type="time"
          value={draft.time}
          onChange={(e) => onChange({ time: e.target.value })}
          aria-invalid={errors.time ? true : undefined}
          aria-describedby={`${id}-time-error`}
          className={input(errors.time)}
        />
        {errors.time && (
          <p id={`${id}-time-error`} className="text-sm font-semibold text-alarm-700">
            {errors.time}
          </p>
        )}
      </div>
      <div className="flex min-w-48 flex-col gap-1">
        <label htmlFor={`${id}-person`} className="text-sm font-semibold text-tide-800">
          Done by
        </label>
        <select
          id={`${id}-person`}
          value={draft.personId ?? ''}
          onChange={(e) => onChange({ personId: e.target.value ? Number(e.target.value) : null })}
          aria-invalid={errors.person ? true : undefined}
          aria-describedby={`${id}-person-error`}
          className={input(errors.person)}
        >
          <option value="">Choose…</option>
          {people.map((p) => (
            <option key={p.id} value={p.id}>
              {p.name}
            </option>
          ))}
        </select>
        {errors.person && (
          <p id={`${id}-person-error`} className="text-sm font-semibold text-alarm-700">
            {errors.person}
          </p>
        )}
      </div>
    </div>
  )
}
