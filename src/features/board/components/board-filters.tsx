import { X } from 'lucide-react'
import type { Area } from '#shared/schemas/facility'
import { CATEGORY_LABELS, ROUTINE_CATEGORIES, type Category } from '#shared/schemas/routine'
import { TASK_STATUSES, type TaskStatus } from '#shared/schemas/task'
import { isFiltered, type BoardFilters } from '../utils/board-filters'
import { STATUS_LOOK } from '../../../components/ui/task-status-label'

interface Props {
  areas: Area[]
  value: BoardFilters
  onChange: (next: BoardFilters) => void
}

const selectClass = 'min-h-11 w-full rounded-lg border border-tide-200 bg-white px-2 sm:w-36 xl:w-44'

export function BoardFiltersBar({ areas, value, onChange }: Props) {
  return (
    <fieldset className="grid w-full grid-cols-2 items-end gap-2 sm:flex sm:w-auto sm:flex-wrap">
      <legend className="sr-only">Filter the cards</legend>
      <label className="flex min-w-0 flex-col gap-1 text-sm font-semibold text-tide-800">
        Area
        <select
          value={value.areaId ?? ''}
          onChange={(e) => onChange({ ...value, areaId: e.target.value ? Number(e.target.value) : null })}
          className={selectClass}
        >
          <option value="">All areas</option>
          {areas.map((a) => (
            <option key={a.id} value={a.id}>
              {a.name}
            </option>
          ))}
        </select>
      </label>
      <label className="flex min-w-0 flex-col gap-1 text-sm font-semibold text-tide-800">
        Category
        <select
          value={value.category ?? ''}
          onChange={(e) => onChange({ ...value, category: (e.target.value || null) as Category | null })}
          className={selectClass}
        >
          <option value="">All categories</option>
          {ROUTINE_CATEGORIES.map((c) => (
            <option key={c} value={c}>
              {CATEGORY_LABELS[c]}
            </option>
          ))}
        </select>
      </label>
      <label className="flex min-w-0 flex-col gap-1 text-sm font-semibold text-tide-800">
        Status
        <select
          value={value.status ?? ''}
          onChange={(e) => onChange({ ...value, status: (e.target.value || null) as TaskStatus | null })}
          className={selectClass}
        >
          <option value="">All statuses</option>
          {TASK_STATUSES.map((s) => (
            <option key={s} value={s}>
              {STATUS_LOOK[s].label}
            </option>
          ))}
        </select>
      </label>
      {isFiltered(value) && (
        <button
          type="button"
          onClick={() => onChange({ areaId: null, category: null, status: null })}
          className="inline-flex min-h-11 items-center gap-1 rounded-lg px-3 font-semibold text-tide-700 hover:bg-tide-100"
        >
          <X aria-hidden className="size-4" /> Clear filters
        </button>
      )}
    </fieldset>
  )
}
