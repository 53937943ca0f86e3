import { createColumnHelper } from '@tanstack/react-table'
import { useMemo } from 'react'
import type { Area, Equipment } from '#shared/schemas/facility'
import { nameById } from '../utils/format'
import { useSearchableTable } from '../hooks/use-searchable-table'
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

  const { table, search, setSearch } = useSearchableTable(equipment, columns, [{ id: 'code', desc: false }])

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
