import type { ReactNode } from 'react'

interface TableToolbarProps {
  search: string
  onSearch: (value: string) => void
  searchLabel: string
  placeholder: string
  shown: number
  total: number
  noun: string
  children?: ReactNode
}

/** Search box, extra filters and a live "showing n of m" line above a catalogue table. */
export function TableToolbar({ search, onSearch, searchLabel, placeholder, shown, total, noun, children }: TableToolbarProps) {
  return (
    <div className="flex flex-col gap-2">
      <div className="flex flex-col gap-2 sm:flex-row sm:flex-wrap sm:items-end">
        <div className="flex flex-col gap-1 sm:w-72">
          <label className="text-sm font-semibold text-tide-800" htmlFor={`${noun}-search`}>
            {searchLabel}
          </label>
          <input
            id={`${noun}-search`}
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
        {shown === total ? `${total} ${noun}` : `Showing ${shown} of ${total} ${noun}`}
      </p>
    </div>
  )
}
