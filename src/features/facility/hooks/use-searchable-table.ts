import { getCoreRowModel, getFilteredRowModel, getSortedRowModel, useReactTable, type SortingState, type TableOptions } from '@tanstack/react-table'
import { useState } from 'react'

/** A table sortable by any column and filtered by one search box, as every catalogue list is. */
export function useSearchableTable<T>(data: T[], columns: TableOptions<T>['columns'], initialSort: SortingState) {
  const [sorting, setSorting] = useState<SortingState>(initialSort)
  const [search, setSearch] = useState('')
  const table = useReactTable({
    data,
    columns,
    state: { sorting, globalFilter: search },
    onSortingChange: setSorting,
    onGlobalFilterChange: setSearch,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
  })
  return { table, search, setSearch }
}
