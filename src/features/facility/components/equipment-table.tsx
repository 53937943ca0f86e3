import { createColumnHelper, getCoreRowModel, getFilteredRowModel, getSortedRowModel, useReactTable, type SortingState } from '@tanstack/react-table'
import { useMemo, useState } from 'react'
import type { Area, Equipment } from '#shared/schemas/facility'
import { nameById } from '../utils/format'
import { DataTable } from './data-table'
import { RowActions } from './row-actions'
import { TableToolbar } from './table-toolbar'

interface EquipmentTableProps {
  equipment: Equipment[]
  areas: Area[]
  canEdit: boolean
  onEdit: (equipment: Equipment) => void
}

const column = createColumnHelper<Equipment>()

export function EquipmentTable({ equipment, areas, canEdit, onEdit }: EquipmentTableProps) {
  const [sorting, setSorting] = useState<SortingState>([{ id: 'code', desc: false }])
  const [search, setSearch] = useState('')

  const columns = useMemo(() => {
    const areaName = nameById(areas)
    return [
      column.accessor('code', { header: 'Code' }),
      column.accessor('name', { header: 'Name' }),
      column.accessor('kind', { header: 'Kind' }),
      column.accessor((e) => areaName(e.areaId, 'No single area'), { id: 'area', header: 'Area' }),
      ...(canEdit
        ? [
            column.display({
              id: 'actions',
              header: 'Actions',
              cell: ({ row }) => (
                <RowActions name="equipment" id={row.original.id} label={`equipment ${row.original.code}`} onEdit={() => onEdit(row.original)} />
              ),
            }),
          ]
        : []),
    ]
  }, [areas, canEdit, onEdit])

  const table = useReactTable({
    data: equipment,
    columns,
    state: { sorting, globalFilter: search },
    onSortingChange: setSorting,
    onGlobalFilterChange: setSearch,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
  })

  return (
    <div className="flex flex-col gap-3">
      <TableToolbar
        search={search}
        onSearch={setSearch}
        searchLabel="Find equipment"
        placeholder="Code, name, kind or area"
        shown={table.getFilteredRowModel().rows.length}
        total={equipment.length}
        nouns={['piece of equipment', 'pieces of equipment']}
      />
      <DataTable table={table} caption="Equipment" minWidth="min-w-[36rem]" emptyText={equipment.length ? 'Nothing matches.' : 'No equipment yet.'} />
    </div>
  )
}
