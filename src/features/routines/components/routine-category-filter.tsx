import { CATEGORY_LABELS, ROUTINE_CATEGORIES, type Category, type Routine } from '#shared/schemas/routine'

export function RoutineCategoryFilter({
  routines,
  value,
  onChange,
}: {
  routines: Routine[]
  value: Category | null
  onChange: (category: Category | null) => void
}) {
  const counts = new Map<Category, number>()
  for (const r of routines) counts.set(r.category, (counts.get(r.category) ?? 0) + 1)
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor="routine-category-filter" className="text-sm font-semibold text-tide-800">
        Category
      </label>
      <select
        id="routine-category-filter"
        value={value ?? ''}
        onChange={(e) => onChange((e.target.value || null) as Category | null)}
        className="min-h-11 w-full rounded-lg border border-tide-200 bg-white px-3 sm:w-72"
      >
        <option value="">All categories ({routines.length})</option>
        {ROUTINE_CATEGORIES.filter((c) => counts.has(c) || c === value).map((c) => (
          <option key={c} value={c}>
            {CATEGORY_LABELS[c]} ({counts.get(c) ?? 0})
          </option>
        ))}
      </select>
    </div>
  )
}
