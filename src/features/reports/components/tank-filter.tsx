import { ChevronDown } from 'lucide-react'

interface TankFilterProps {
  tanks: Array<{ id: number; code: string; name: string }>
  selected: number[]
  onChange: (ids: number[]) => void
}

/** Which tanks the welfare record covers; none ticked means every tank. */
export function TankFilter({ tanks, selected, onChange }: TankFilterProps) {
  const toggle = (id: number) => onChange(selected.includes(id) ? selected.filter((x) => x !== id) : [...selected, id].sort((a, b) => a - b))
  const summary = selected.length === 0 ? 'All tanks' : `${selected.length} tank${selected.length === 1 ? '' : 's'}`
  return (
    <details className="group w-full max-w-md rounded-lg bg-white ring-1 ring-tide-200 print:hidden">
      <summary className="flex min-h-11 cursor-pointer list-none items-center justify-between gap-2 px-3 font-semibold text-tide-800">
        Tanks: {summary}
        <ChevronDown aria-hidden className="size-4 transition-transform group-open:rotate-180" />
      </summary>
      <fieldset className="max-h-64 overflow-y-auto border-t border-tide-100 p-2">
        <legend className="sr-only">Tanks in the welfare record</legend>
        {selected.length > 0 && (
          <button type="button" onClick={() => onChange([])} className="mb-1 min-h-9 px-2 text-sm font-semibold text-tide-700 underline">
            Clear: all tanks
          </button>
        )}
        {tanks.map((t) => (
          <label key={t.id} className="flex min-h-9 items-center gap-2 px-2 text-sm">
            <input type="checkbox" checked={selected.includes(t.id)} onChange={() => toggle(t.id)} className="size-4" />
            <span className="font-semibold text-tide-900">{t.code}</span> {t.name}
          </label>
        ))}
      </fieldset>
    </details>
  )
}
