import { ChevronDown } from 'lucide-react'
import { useState } from 'react'
import { Button } from '../../../components/ui/button'

interface TankFilterProps {
  tanks: Array<{ id: number; code: string; name: string }>
  selected: number[]
  onChange: (ids: number[]) => void
}

/** Which tanks the welfare record covers; none ticked means every tank. Ticks apply together; key it by the selection to reset. */
export function TankFilter({ tanks, selected, onChange }: TankFilterProps) {
  const [draft, setDraft] = useState(selected)
  const toggle = (id: number) => setDraft((d) => (d.includes(id) ? d.filter((x) => x !== id) : [...d, id].sort((a, b) => a - b)))
  const summary = selected.length === 0 ? 'All tanks' : `${selected.length} tank${selected.length === 1 ? '' : 's'}`
  const unchanged = draft.join(',') === selected.join(',')
  return (
    <details className="group w-full max-w-md rounded-lg bg-white ring-1 ring-tide-200 print:hidden">
      <summary className="flex min-h-11 cursor-pointer list-none items-center justify-between gap-2 px-3 font-semibold text-tide-800">
        Tanks: {summary}
        <ChevronDown aria-hidden className="size-4 transition-transform group-open:rotate-180" />
      </summary>
      <fieldset className="max-h-64 overflow-y-auto border-t border-tide-100 p-2">
        <legend className="sr-only">Tanks in the welfare record</legend>
        {tanks.map((t) => (
          <label key={t.id} className="flex min-h-9 items-center gap-2 px-2 text-sm">
            <input type="checkbox" checked={draft.includes(t.id)} onChange={() => toggle(t.id)} className="size-4" />
            <span className="font-semibold text-tide-900">{t.code}</span> {t.name}
          </label>
        ))}
      </fieldset>
      <div className="flex flex-wrap gap-2 border-t border-tide-100 p-2">
        <Button type="button" variant="secondary" disabled={unchanged} onClick={() => onChange(draft)}>
          Show these tanks
        </Button>
        {draft.length > 0 && (
          <Button type="button" variant="ghost" onClick={() => setDraft([])}>
            Clear: all tanks
          </Button>
        )}
      </div>
    </details>
  )
}
