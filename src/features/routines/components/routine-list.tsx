import { ChevronRight, Crosshair, Repeat } from 'lucide-react'
import { Link } from 'react-router-dom'
import { CATEGORY_LABELS, type Category, type Routine } from '#shared/schemas/routine'
import { summariseRule } from '../utils/rule-preview'
import { describeTargets } from '../utils/target-text'
import { PausedLabel } from './paused-label'
import { PlanningErrorLabel } from './planning-error-label'
import { PriorityLabel } from './priority-label'
import { RoutineCategoryFilter } from './routine-category-filter'

export function RoutineList({
  routines,
  category,
  onCategoryChange,
}: {
  routines: Routine[]
  category: Category | null
  onCategoryChange: (category: Category | null) => void
}) {
  const shown = category ? routines.filter((r) => r.category === category) : routines
  if (routines.length === 0) {
    return (
      <div className="flex max-w-xl gap-3 rounded-xl border border-tide-200 bg-white p-5">
        <Repeat aria-hidden className="size-6 shrink-0 text-tide-500" />
        <div>
          <p className="font-semibold text-tide-900">No routines yet</p>
          <p className="mt-1 text-tide-700">A routine turns recurring care (feeds, checks, water tests) into dated tasks on the board.</p>
        </div>
      </div>
    )
  }
  return (
    <div className="flex flex-col gap-3">
      <RoutineCategoryFilter routines={routines} value={category} onChange={onCategoryChange} />
      <ul aria-label="Routines" className="divide-y divide-tide-100 overflow-hidden rounded-xl border border-tide-200 bg-white">
        {shown.map((r) => (
          <li key={r.id}>
            <Link
              to={`/routines/${r.id}`}
              className="grid min-h-11 gap-x-4 gap-y-1 px-4 py-3 hover:bg-tide-50 md:grid-cols-[minmax(0,2fr)_minmax(0,2fr)_minmax(0,1fr)_1.5rem] md:items-center"
            >
              <span className="flex flex-col">
                <span className="font-semibold text-tide-900">{r.name}</span>
                <span className="text-sm text-tide-600">{CATEGORY_LABELS[r.category]}</span>
              </span>
              <span className="flex flex-col gap-1">
                <span className="text-tide-800">{summariseRule(r.rrule, r.dtstart)}</span>
                {(r.priority === 'welfare_critical' || r.paused || r.planningError) && (
                  <span className="flex flex-wrap gap-2">
                    <PriorityLabel priority={r.priority} />
                    {r.paused && <PausedLabel />}
                    {r.planningError && <PlanningErrorLabel reason={r.planningError} />}
                  </span>
                )}
              </span>
              <span className="flex items-center gap-1 text-sm text-tide-700">
                <Crosshair aria-hidden className="size-4 shrink-0" /> {describeTargets(r)}
              </span>
              <ChevronRight aria-hidden className="hidden size-5 text-tide-400 md:block" />
            </Link>
          </li>
        ))}
        {shown.length === 0 && <li className="px-4 py-6 text-center text-tide-600">No routines in this category.</li>}
      </ul>
    </div>
  )
}
