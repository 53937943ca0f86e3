import { useId, type ReactNode } from 'react'

interface TableToolbarProps {
  search: string
  onSearch: (value: string) => void
  searchLabel: string
  placeholder: string
  shown: number
  total: number
  /** Singular and plural, e.g. ['tank', 'tanks']. */
  nouns: readonly [string, string]
  children?: ReactNode
}

/** Search box, extra filters and a live "showing n of m" line above a catalogue table. */
export function TableToolbar({ search, onSearch, searchLabel, placeholder, shown, total, nouns, children }: TableToolbarProps) {
  const id = useId()
  const count = (n: number) => `${n} ${n === 1 ? nouns[0] : nouns[1]}`
  return (
    <div className="flex flex-col gap-2">
      <div className="flex flex-col gap-2 sm:flex-row sm:flex-wrap sm:items-end">
        <div className="flex flex-col gap-1 sm:w-72">
          <label className="text-sm font-semibold text-tide-800" htmlFor={id}>
            {searchLabel}
          </label>
          <input
            id={id}
            type="search"
            placeholder={placeholder}
            value={search}
            onChange={(e) => onSearch(e.target.value)}
            className="min-h-11 rounded-lg border border-tide-200 bg-white px-3"
          />
        </div>
        {children}
      </div>
      <p aria-live="polite" className="text-sm text-tide-600">
        {shown === total ? count(total) : `Showing ${shown} of ${count(total)}`}
      </p>
    </div>
  )
}
