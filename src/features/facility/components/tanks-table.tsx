import {
  createColumnHelper,
  getCoreRowModel,
  getFilteredRowModel,
  getSortedRowModel,
  useReactTable,
  type ColumnFiltersState,
  type SortingState,
} from '@tanstack/react-table'
import { useMemo, useState } from 'react'
import { Link } from 'react-router-dom'
import type { Area, System, Tank } from '#shared/schemas/facility'
import { formatLitres, nameById } from '../utils/format'
import { DataTable } from './data-table'
import { RowActions } from './row-actions'
import { TableToolbar } from './table-toolbar'
import { TankUseStatus } from './tank-use-status'

interface TanksTableProps {
  tanks: Tank[]
  areas: Area[]
  systems: System[]
  canEdit: boolean
  onEdit: (tank: Tank) => void
}

const column = createColumnHelper<Tank>()
const selectClass = 'min-h-11 rounded-lg border border-tide-200 bg-white px-3 font-normal'

export function TanksTable({ tanks, areas, systems, canEdit, onEdit }: TanksTableProps) {
  const [sorting, setSorting] = useState<SortingState>([{ id: 'code', desc: false }])
  const [search, setSearch] = useState('')
  const [filters, setFilters] = useState<ColumnFiltersState>([])
  const filterValue = (id: string) => filters.find((f) => f.id === id)?.value
  const setFilter = (id: string, value: unknown) => setFilters((prev) => [...prev.filter((f) => f.id !== id), ...(value === undefined ? [] : [{ id, value }])])

  const columns = useMemo(() => {
    const areaName = nameById(areas)
    const systemName = nameById(systems)
    return [
      column.accessor('code', {
        header: 'Code',
        cell: (info) => (
          <Link to={`/tanks/${info.row.original.id}`} className="font-semibold text-tide-800 underline">
            {info.getValue()}
          </Link>
        ),
      }),
      column.accessor('name', { header: 'Name' }),
      column.accessor((t) => areaName(t.areaId), {
        id: 'area',
        header: 'Area',
        filterFn: (row, _id, value: number) => row.original.areaId === value,
      }),
      column.accessor((t) => systemName(t.systemId, 'Standalone'), { id: 'system', header: 'System' }),
      column.accessor('volumeL', {
        header: 'Volume',
        cell: (info) => <span className="whitespace-nowrap tabular-nums">{formatLitres(info.getValue())}</span>,
      }),
      column.accessor('kind', { header: 'Kind', cell: (info) => (info.getValue() === 'bin' ? 'Bin' : 'Tank') }),
      column.accessor('inUse', {
        header: 'State',
        cell: (info) => <TankUseStatus inUse={info.getValue()} />,
        filterFn: (row, id, value: boolean) => row.getValue(id) === value,
      }),
      ...(canEdit
        ? [
            column.display({
              id: 'actions',
              header: 'Actions',
              cell: ({ row }) => <RowActions name="tanks" id={row.original.id} label={`tank ${row.original.code}`} onEdit={() => onEdit(row.original)} />,
            }),
          ]
        : []),
    ]
  }, [areas, systems, canEdit, onEdit])

  const table = useReactTable({
    data: tanks,
    columns,
    state: { sorting, globalFilter: search, columnFilters: filters },
    onSortingChange: setSorting,
    onGlobalFilterChange: setSearch,
    onColumnFiltersChange: setFilters,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
  })

  const areaFilter = filterValue('area') as number | undefined
  const useFilter = filterValue('inUse') as boolean | undefined
  return (
    <div className="flex flex-col gap-3">
      <TableToolbar
        search={search}
        onSearch={setSearch}
        searchLabel="Find tanks"
        placeholder="Code, name, area or system"
        shown={table.getFilteredRowModel().rows.length}
        total={tanks.length}
        nouns={['tank', 'tanks']}
      >
        <label className="flex flex-col gap-1 text-sm font-semibold text-tide-800">
          Area
          <select className={selectClass} value={areaFilter ?? ''} onChange={(e) => setFilter('area', e.target.value ? Number(e.target.value) : undefined)}>
            <option value="">All areas</option>
            {areas.map((a) => (
              <option key={a.id} value={a.id}>
                {a.name}
              </option>
            ))}
          </select>
        </label>
        <label className="flex flex-col gap-1 text-sm font-semibold text-tide-800">
          State
          <select
            className={selectClass}
            value={useFilter === undefined ? '' : useFilter ? 'in-use' : 'empty'}
            onChange={(e) => setFilter('inUse', e.target.value === '' ? undefined : e.target.value === 'in-use')}
          >
            <option value="">In use and empty</option>
            <option value="in-use">In use only</option>
            <option value="empty">Empty only</option>
          </select>
        </label>
      </TableToolbar>
      <DataTable table={table} caption="Tanks" emptyText={tanks.length ? 'No tank matches these filters.' : 'No tanks yet.'} />
    </div>
  )
}
