import { useId, useState } from 'react'
import type { Area, Tank } from '#shared/schemas/facility'

/** Tanks as checkboxes grouped by area, with a filter once the list gets long. */
export function TankChecklist({
  tanks,
  areas,
  value,
  onChange,
  error,
}: {
  tanks: Tank[]
  areas: Area[]
  value: number[]
  onChange: (ids: number[]) => void
  error?: string
}) {
  const id = useId()
  const [filter, setFilter] = useState('')
  const needle = filter.trim().toLowerCase()
  const shown = needle ? tanks.filter((t) => `${t.code} ${t.name}`.toLowerCase().includes(needle)) : tanks
  const chosen = new Set(value)
  const toggle = (tankId: number, on: boolean) => onChange(on ? [...value, tankId] : value.filter((v) => v !== tankId))
  const groups = [...areas]
    .sort((a, b) => a.roundOrder - b.roundOrder)
    .map((a) => ({ area: a, tanks: shown.filter((t) => t.areaId === a.id) }))
    .filter((g) => g.tanks.length)

  return (
    <div role="group" aria-labelledby={`${id}-label`} aria-describedby={error ? `${id}-error` : undefined} className="flex flex-col gap-2">
      <p id={`${id}-label`} className="text-sm font-semibold text-tide-800">
        Tanks <span className="font-normal text-tide-600">({value.length} chosen)</span>
      </p>
      {tanks.length > 8 && (
        <input
          type="search"
          aria-label="Filter tanks"
          placeholder="Filter by code or name"
          value={filter}
          onChange={(e) => setFilter(e.target.value)}
          className="min-h-11 rounded-lg border border-tide-200 bg-white px-3"
        />
      )}
      <div className={`max-h-72 overflow-y-auto rounded-lg border ${error ? 'border-alarm-500' : 'border-tide-200'}`}>
        {shown.length === 0 && <p className="p-3 text-tide-600">{tanks.length ? 'Nothing matches that filter.' : 'There are no tanks yet.'}</p>}
        {groups.map(({ area, tanks: inArea }) => (
          <div key={area.id}>
            <p className="sticky top-0 bg-tide-50 px-3 py-1 text-xs font-bold tracking-wide text-tide-700 uppercase">{area.name}</p>
            {inArea.map((t) => (
              <label key={t.id} className="flex min-h-11 cursor-pointer items-center gap-3 border-t border-tide-100 px-3 hover:bg-tide-50">
                <input type="checkbox" className="size-5 shrink-0" checked={chosen.has(t.id)} onChange={(e) => toggle(t.id, e.target.checked)} />
                <span className="min-w-0 flex-1 truncate text-tide-900">
                  {t.code} · {t.name}
                </span>
                {!t.inUse && <span className="shrink-0 text-sm text-tide-600">not in use</span>}
              </label>
            ))}
          </div>
        ))}
      </div>
      {error && (
        <p id={`${id}-error`} className="text-sm font-semibold text-alarm-700">
          {error}
        </p>
      )}
    </div>
  )
}
