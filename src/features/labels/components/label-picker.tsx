import { useId } from 'react'
import type { Area, Tank } from '#shared/schemas/facility'

export type LabelChoice = { kind: 'tank'; id: number | null } | { kind: 'area'; id: number | null }

interface LabelPickerProps {
  choice: LabelChoice
  tanks: Tank[]
  areas: Area[]
  onChange: (choice: LabelChoice) => void
}

const field = 'min-h-11 rounded-lg border border-tide-200 bg-white px-3 text-base'

/** One tank's label, or a sheet for every tank of an area. */
export function LabelPicker({ choice, tanks, areas, onChange }: LabelPickerProps) {
  const id = useId()
  return (
    <form aria-label="Choose labels" onSubmit={(e) => e.preventDefault()} className="flex flex-wrap items-end gap-3 print:hidden">
      <div className="flex flex-col gap-1">
        <label htmlFor={`${id}-kind`} className="text-sm font-semibold text-tide-800">
          Labels for
        </label>
        <select
          id={`${id}-kind`}
          value={choice.kind}
          className={field}
          onChange={(e) => onChange(e.target.value === 'area' ? { kind: 'area', id: areas[0]?.id ?? null } : { kind: 'tank', id: tanks[0]?.id ?? null })}
        >
          <option value="tank">One tank</option>
          <option value="area">Every tank in an area</option>
        </select>
      </div>
      <div className="flex min-w-56 flex-col gap-1">
        <label htmlFor={`${id}-which`} className="text-sm font-semibold text-tide-800">
          {choice.kind === 'area' ? 'Area' : 'Tank'}
        </label>
        <select id={`${id}-which`} value={choice.id ?? ''} className={field} onChange={(e) => onChange({ ...choice, id: Number(e.target.value) })}>
          {choice.id === null && <option value="">Choose…</option>}
          {choice.kind === 'area'
            ? areas.map((a) => (
                <option key={a.id} value={a.id}>
                  {a.name} ({a.code})
                </option>
              ))
            : tanks.map((t) => (
                <option key={t.id} value={t.id}>
                  {t.code} · {t.name}
                </option>
              ))}
        </select>
      </div>
    </form>
  )
}
