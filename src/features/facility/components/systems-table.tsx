import { createColumnHelper } from '@tanstack/react-table'
import { useMemo } from 'react'
import type { Area, System, Tank } from '#shared/schemas/facility'
import { formatLitres, formatNumber, nameById } from '../utils/format'
import { useSearchableTable } from '../hooks/use-searchable-table'
import { DataTable } from './data-table'
import { RowActions } from './row-actions'
import { TableToolbar } from './table-toolbar'

interface SystemsTableProps {
  systems: System[]
  areas: Area[]
  tanks: Tank[]
  canEdit: boolean
  onEdit: (system: System) => void
}

const column = createColumnHelper<System>()

export function SystemsTable({ systems, areas, tanks, canEdit, onEdit }: SystemsTableProps) {
  const columns = useMemo(() => {
    const areaName = nameById(areas)
    const tankCount = (id: number) => tanks.filter((t) => t.systemId === id).length
    return [
      column.accessor('code', { header: 'Code' }),
      column.accessor('name', { header: 'Name' }),
      column.accessor((s) => areaName(s.areaId, 'Several areas'), { id: 'area', header: 'Area' }),
      column.accessor('volumeL', { header: 'Volume', cell: (info) => <span className="whitespace-nowrap tabular-nums">{formatLitres(info.getValue())}</span> }),
      column.accessor('salinitySetpoint', {
        header: 'Salinity',
        cell: (info) => {
          const v = info.getValue()
          return v == null ? 'Fresh water' : `${formatNumber(v)} ppt`
        },
      }),
      column.accessor((s) => tankCount(s.id), { id: 'tanks', header: 'Tanks' }),
      ...(canEdit
        ? [
            column.display({
              id: 'actions',
              header: 'Actions',
              cell: ({ row }) => {
                const count = tankCount(row.original.id)
                return (
                  <RowActions
                    name="systems"
                    id={row.original.id}
                    label={`system ${row.original.code}`}
                    onEdit={() => onEdit(row.original)}
                    blockedReason={
                      count
                        ? `${count === 1 ? '1 tank is' : `${count} tanks are`} on this system. Move them to another system or make them standalone first.`
                        : undefined
                    }
                  />
                )
              },
            }),
          ]
        : []),
    ]
  }, [areas, tanks, canEdit, onEdit])

  const { table, search, setSearch } = useSearchableTable(systems, columns, [{ id: 'code', desc: false }])

  return (
    <div className="flex flex-col gap-3">
      <TableToolbar
        search={search}
        onSearch={setSearch}
        searchLabel="Find systems"
        placeholder="Code, name or area"
        shown={table.getFilteredRowModel().rows.length}
        total={systems.length}
        nouns={['system', 'systems']}
      />
      <DataTable table={table} caption="Systems" emptyText={systems.length ? 'No system matches.' : 'No systems yet.'} />
    </div>
  )
}
