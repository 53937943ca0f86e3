import type { Tank } from '#shared/schemas/facility'

interface TankPickerProps {
  tanks: Tank[]
  value: number[]
  onChange: (ids: number[]) => void
  error?: string
}

export function TankPicker({ tanks, value, onChange, error }: TankPickerProps) {
  const toggle = (id: number, on: boolean) => onChange(on ? [...value, id] : value.filter((v) => v !== id))
  return (
    <fieldset className="flex flex-col gap-1 sm:col-span-2 lg:col-span-3">
      <legend className="mb-1 text-sm font-semibold text-tide-800">Tanks holding this batch</legend>
      {tanks.length === 0 ? (
        <p className="text-sm text-tide-600">No tanks yet.</p>
      ) : (
        <div className="grid max-h-52 grid-cols-2 gap-x-4 overflow-y-auto rounded-lg border border-tide-200 p-2 sm:grid-cols-3 lg:grid-cols-5">
          {tanks.map((t) => (
            <label key={t.id} className="flex min-h-11 items-center gap-2 text-tide-800">
              <input type="checkbox" className="size-5 accent-tide-700" checked={value.includes(t.id)} onChange={(e) => toggle(t.id, e.target.checked)} />
              <span className="truncate" title={t.name}>
                {t.code}
              </span>
            </label>
          ))}
        </div>
      )}
      {error && <p className="text-sm font-semibold text-alarm-700">{error}</p>}
    </fieldset>
  )
}
