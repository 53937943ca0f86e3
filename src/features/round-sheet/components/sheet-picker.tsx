import { useId } from 'react'
import type { SheetFilter } from '../api/round-sheet-queries'

interface SheetPickerProps {
  filter: SheetFilter
  people: Array<{ id: number; name: string }>
  areas: Array<{ id: number; name: string }>
  onChange: (filter: SheetFilter) => void
}

const field = 'min-h-11 rounded-lg border border-tide-200 bg-white px-3 text-base'

/** Which day's sheet, and for one person or one area. */
export function SheetPicker({ filter, people, areas, onChange }: SheetPickerProps) {
  const id = useId()
  const byArea = filter.areaId !== null
  return (
    <form aria-label="Choose the sheet" onSubmit={(e) => e.preventDefault()} className="flex flex-wrap items-end gap-3 print:hidden">
      <div className="flex flex-col gap-1">
        <label htmlFor={`${id}-date`} className="text-sm font-semibold text-tide-800">
          Day
        </label>
        <input
          id={`${id}-date`}
          type="date"
          required
          value={filter.date}
          className={field}
          onChange={(e) => e.target.value && onChange({ ...filter, date: e.target.value })}
        />
      </div>
      <div className="flex flex-col gap-1">
        <label htmlFor={`${id}-kind`} className="text-sm font-semibold text-tide-800">
          Sheet for
        </label>
        <select
          id={`${id}-kind`}
          value={byArea ? 'area' : 'person'}
          className={field}
          onChange={(e) =>
            onChange(
              e.target.value === 'area'
                ? { ...filter, personId: null, areaId: areas[0]?.id ?? null }
                : { ...filter, areaId: null, personId: people[0]?.id ?? null },
            )
          }
        >
          <option value="person">A person</option>
          <option value="area">An area</option>
        </select>
      </div>
      {byArea ? (
        <div className="flex flex-col gap-1">
          <label htmlFor={`${id}-area`} className="text-sm font-semibold text-tide-800">
            Area
          </label>
          <select id={`${id}-area`} value={filter.areaId ?? ''} className={field} onChange={(e) => onChange({ ...filter, areaId: Number(e.target.value) })}>
            {areas.map((a) => (
              <option key={a.id} value={a.id}>
                {a.name}
              </option>
            ))}
          </select>
        </div>
      ) : (
        <div className="flex flex-col gap-1">
          <label htmlFor={`${id}-person`} className="text-sm font-semibold text-tide-800">
            Person
          </label>
          <select
            id={`${id}-person`}
            value={filter.personId ?? ''}
            className={field}
            onChange={(e) => onChange({ ...filter, personId: Number(e.target.value) })}
          >
            {people.map((p) => (
              <option key={p.id} value={p.id}>
                {p.name}
              </option>
            ))}
          </select>
        </div>
      )}
    </form>
  )
}
