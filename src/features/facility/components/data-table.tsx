import { flexRender, type Table } from '@tanstack/react-table'
import { clsx } from 'clsx'
import { ArrowDown, ArrowDownUp, ArrowUp } from 'lucide-react'

interface DataTableProps<T> {
  table: Table<T>
  caption: string
  emptyText: string
  /** Below this width the table scrolls sideways, keeping its first column in view. */
  minWidth?: string
}

/** Dense, sortable table for desktop that scrolls sideways on a phone. */
export function DataTable<T>({ table, caption, emptyText, minWidth = 'min-w-[40rem]' }: DataTableProps<T>) {
  const rows = table.getRowModel().rows
  return (
    <div className="overflow-x-auto rounded-xl border border-tide-200 bg-white">
      <table className={clsx('w-full whitespace-nowrap text-left text-sm', minWidth)}>
        <caption className="sr-only">{caption}</caption>
        <thead className="bg-tide-100 text-tide-800">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header, index) => {
                const sorted = header.column.getIsSorted()
                const SortIcon = sorted === 'asc' ? ArrowUp : sorted === 'desc' ? ArrowDown : ArrowDownUp
                return (
                  <th
                    key={header.id}
                    scope="col"
                    aria-sort={sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : undefined}
                    className={clsx('whitespace-nowrap px-3 py-2 font-semibold', index === 0 && 'sticky left-0 z-10 bg-tide-100 shadow-[1px_0_0_#aed3dd]')}
                  >
                    {header.column.getCanSort() ? (
                      <button type="button" onClick={header.column.getToggleSortingHandler()} className="inline-flex min-h-8 items-center gap-1">
                        {flexRender(header.column.columnDef.header, header.getContext())}
                        <SortIcon aria-hidden className={clsx('size-3.5', !sorted && 'opacity-50')} />
                      </button>
                    ) : (
                      flexRender(header.column.columnDef.header, header.getContext())
                    )}
                  </th>
                )
              })}
            </tr>
          ))}
        </thead>
        <tbody>
          {rows.map((row) => (
            <tr key={row.id} className="border-t border-tide-100 align-middle hover:bg-tide-50/60">
              {row.getVisibleCells().map((cell, index) => (
                <td
                  key={cell.id}
                  className={clsx('px-3 py-2 md:py-1.5', index === 0 && 'sticky left-0 z-10 bg-white font-semibold text-tide-900 shadow-[1px_0_0_#d5e9ee]')}
                >
                  {flexRender(cell.column.columnDef.cell, cell.getContext())}
                </td>
              ))}
            </tr>
          ))}
          {rows.length === 0 && (
            <tr>
              <td colSpan={table.getVisibleLeafColumns().length} className="px-3 py-6 text-center text-tide-600">
                {emptyText}
              </td>
            </tr>
          )}
        </tbody>
      </table>
    </div>
  )
}
