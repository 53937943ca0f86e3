import {
  createColumnHelper,
  flexRender,
  getCoreRowModel,
  getFilteredRowModel,
  getSortedRowModel,
  useReactTable,
  type SortingState,
} from '@tanstack/react-table'
import { ArrowDownUp } from 'lucide-react'
import { useMemo, useState } from 'react'
import { ROLES, ROLE_LABELS, type Person, type Role } from '#shared/schemas/person'
import { useUpdatePerson } from '../api/use-people-mutations'
import { ResetPasswordButton } from './reset-password-button'

const column = createColumnHelper<Person>()

export function PeopleTable({ people, meId }: { people: Person[]; meId: number }) {
  const [sorting, setSorting] = useState<SortingState>([{ id: 'name', desc: false }])
  const [filter, setFilter] = useState('')
  const update = useUpdatePerson()

  const columns = useMemo(
    () => [
      column.accessor('name', { header: 'Name' }),
      column.accessor('email', { header: 'E-mail' }),
      column.accessor('role', {
        header: 'Role',
        cell: (info) => (
          <select
            aria-label={`Role of ${info.row.original.name}`}
            value={info.getValue()}
            disabled={info.row.original.id === meId}
            onChange={(e) => update.mutate({ id: info.row.original.id, role: e.target.value as Role })}
            className="min-h-9 rounded border border-tide-200 bg-white px-2"
          >
            {ROLES.map((r) => (
              <option key={r} value={r}>
                {ROLE_LABELS[r]}
              </option>
            ))}
          </select>
        ),
      }),
      column.accessor('active', {
        header: 'Status',
        cell: (info) => (info.getValue() ? 'Active' : 'Deactivated'),
      }),
      column.display({
        id: 'actions',
        header: 'Actions',
        cell: ({ row }) =>
          row.original.id === meId ? (
            <span className="text-tide-500">You</span>
          ) : (
            <div className="flex flex-wrap gap-2">
              <button
                type="button"
                className="min-h-9 rounded px-2 font-semibold text-tide-700 underline"
                onClick={() => update.mutate({ id: row.original.id, active: !row.original.active })}
              >
                {row.original.active ? 'Deactivate' : 'Reactivate'}
              </button>
              <ResetPasswordButton person={row.original} />
            </div>
          ),
      }),
    ],
    [meId, update],
  )

  const table = useReactTable({
    data: people,
    columns,
    state: { sorting, globalFilter: filter },
    onSortingChange: setSorting,
    onGlobalFilterChange: setFilter,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
  })

  return (
    <div className="flex flex-col gap-3">
      <input
        type="search"
        aria-label="Filter people"
        placeholder="Filter by name, e-mail or role"
        value={filter}
        onChange={(e) => setFilter(e.target.value)}
        className="min-h-11 max-w-sm rounded-lg border border-tide-200 bg-white px-3"
      />
      <div className="overflow-x-auto rounded-xl border border-tide-200 bg-white">
        <table className="w-full text-left text-sm">
          <thead className="bg-tide-100 text-tide-800">
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => (
                  <th key={header.id} scope="col" className="px-3 py-2 font-semibold" aria-sort={ariaSort(header.column.getIsSorted())}>
                    {header.column.getCanSort() ? (
                      <button type="button" onClick={header.column.getToggleSortingHandler()} className="inline-flex items-center gap-1">
                        {flexRender(header.column.columnDef.header, header.getContext())}
                        <ArrowDownUp aria-hidden className="size-3.5" />
                      </button>
                    ) : (
                      flexRender(header.column.columnDef.header, header.getContext())
                    )}
                  </th>
                ))}
              </tr>
            ))}
          </thead>
          <tbody>
            {table.getRowModel().rows.map((row) => (
              <tr key={row.id} className="border-t border-tide-100">
                {row.getVisibleCells().map((cell) => (
                  <td key={cell.id} className="px-3 py-2">
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                  </td>
                ))}
              </tr>
            ))}
            {table.getRowModel().rows.length === 0 && (
              <tr>
                <td colSpan={columns.length} className="px-3 py-6 text-center text-tide-600">
                  Nobody matches that filter.
                </td>
              </tr>
            )}
          </tbody>
        </table>
      </div>
    </div>
  )
}

function ariaSort(sorted: false | 'asc' | 'desc') {
  return sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : undefined
}
