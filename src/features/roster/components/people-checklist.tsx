import { useId } from 'react'
import type { StaffMember } from '#shared/schemas/person'

export function PeopleChecklist({
  label,
  people,
  value,
  onChange,
  error,
}: {
  label: string
  people: StaffMember[]
  value: number[]
  onChange: (ids: number[]) => void
  error?: string
}) {
  const id = useId()
  return (
    <fieldset aria-describedby={error ? `${id}-error` : undefined} className="flex flex-col gap-1">
      <legend className="mb-1 text-sm font-semibold text-tide-800">
        {label} <span className="font-normal text-tide-600">({value.length} chosen)</span>
      </legend>
      {people.length === 0 ? (
        <p className="text-sm text-tide-700">Nobody is set up for on-call yet; a manager can allow it on the People page.</p>
      ) : (
        <div className="grid gap-x-4 sm:grid-cols-2 lg:grid-cols-3">
          {people.map((p) => (
            <label key={p.id} className="flex min-h-11 items-center gap-2 text-tide-900">
              <input
                type="checkbox"
                className="size-5 accent-tide-700"
                checked={value.includes(p.id)}
                onChange={(e) => onChange(e.target.checked ? [...value, p.id] : value.filter((v) => v !== p.id))}
              />
              {p.name}
            </label>
          ))}
        </div>
      )}
      {error && (
        <p id={`${id}-error`} className="text-sm font-semibold text-alarm-700">
          {error}
        </p>
      )}
    </fieldset>
  )
}
