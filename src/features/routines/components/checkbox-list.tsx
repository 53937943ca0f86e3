import { useId, useState } from 'react'
import type { TargetOption } from '../api/use-target-options'

/** A multi-select as a list of checkboxes, with a filter once the list gets long. */
export function CheckboxList({
  label,
  options,
  value,
  onChange,
  error,
}: {
  label: string
  options: TargetOption[]
  value: number[]
  onChange: (ids: number[]) => void
  error?: string
}) {
  const id = useId()
  const [filter, setFilter] = useState('')
  const needle = filter.trim().toLowerCase()
  const shown = needle ? options.filter((o) => `${o.label} ${o.note ?? ''} ${o.group ?? ''}`.toLowerCase().includes(needle)) : options
  const selected = new Set(value)
  const toggle = (optionId: number, on: boolean) => onChange(on ? [...value, optionId] : value.filter((v) => v !== optionId))
  const groups = [...new Set(shown.map((o) => o.group ?? ''))]

  return (
    <div role="group" aria-labelledby={`${id}-label`} aria-describedby={error ? `${id}-error` : undefined} className="flex flex-col gap-2">
      <div className="flex flex-wrap items-end justify-between gap-2">
        <p id={`${id}-label`} className="text-sm font-semibold text-tide-800">
          {label} <span className="font-normal text-tide-600">({value.length} chosen)</span>
        </p>
        <div className="flex gap-1">
          <button
            type="button"
            onClick={() => onChange([...new Set([...value, ...shown.map((o) => o.id)])])}
            className="min-h-11 rounded-lg px-3 text-sm font-semibold text-tide-700 hover:bg-tide-100"
          >
            Choose all shown
          </button>
          <button type="button" onClick={() => onChange([])} className="min-h-11 rounded-lg px-3 text-sm font-semibold text-tide-700 hover:bg-tide-100">
            Clear
          </button>
        </div>
      </div>
      {options.length > 8 && (
        <input
          type="search"
          aria-label={`Filter ${label.toLowerCase()}`}
          placeholder="Filter by code or name"
          value={filter}
          onChange={(e) => setFilter(e.target.value)}
          className="min-h-11 rounded-lg border border-tide-200 bg-white px-3"
        />
      )}
      <div className={`max-h-80 overflow-y-auto rounded-lg border ${error ? 'border-alarm-500' : 'border-tide-200'}`}>
        {options.length === 0 && <p className="p-3 text-tide-600">There are none in the facility yet.</p>}
        {options.length > 0 && shown.length === 0 && <p className="p-3 text-tide-600">Nothing matches that filter.</p>}
        {groups.map((group) => (
          <div key={group}>
            {group && <p className="sticky top-0 bg-tide-50 px-3 py-1 text-xs font-bold tracking-wide text-tide-700 uppercase">{group}</p>}
            {shown
              .filter((o) => (o.group ?? '') === group)
              .map((o) => (
                <label key={o.id} className="flex min-h-11 cursor-pointer items-center gap-3 border-t border-tide-100 px-3 first:border-t-0 hover:bg-tide-50">
                  <input type="checkbox" className="size-5 shrink-0" checked={selected.has(o.id)} onChange={(e) => toggle(o.id, e.target.checked)} />
                  <span className="min-w-0 flex-1 truncate text-tide-900">{o.label}</span>
                  {o.note && <span className="shrink-0 text-sm text-tide-600">{o.note}</span>}
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
