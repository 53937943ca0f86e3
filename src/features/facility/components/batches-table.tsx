import { createColumnHelper } from '@tanstack/react-table'
import { useMemo } from 'react'
import type { Batch, Tank } from '#shared/schemas/facility'
import { formatNumber } from '../utils/format'
import { BatchStatus, BATCH_STATUS_LABELS } from './batch-status'
import { useSearchableTable } from '../hooks/use-searchable-table'
import { DataTable } from './data-table'
import { RowActions } from './row-actions'
import { TableToolbar } from './table-toolbar'

interface BatchesTableProps {
  batches: Batch[]
  tanks: Tank[]
  canEdit: boolean
  onEdit: (batch: Batch) => void
}

const column = createColumnHelper<Batch>()

export function BatchesTable({ batches, tanks, canEdit, onEdit }: BatchesTableProps) {
  const columns = useMemo(() => {
    const codes = new Map(tanks.map((t) => [t.id, t.code]))
    return [
      column.accessor('code', { header: 'Code' }),
      column.accessor('species', { header: 'Species' }),
      column.accessor((b) => BATCH_STATUS_LABELS[b.status], {
        id: 'status',
        header: 'Status',
        cell: ({ row }) => <BatchStatus status={row.original.status} />,
      }),
      column.accessor('arrivalDate', { header: 'Arrived', cell: (info) => <span className="whitespace-nowrap tabular-nums">{info.getValue()}</span> }),
      column.accessor('count', { header: 'Fish', cell: (info) => <span className="tabular-nums">{formatNumber(info.getValue(), 0)}</span> }),
      column.accessor('meanWeightG', {
        header: 'Mean weight',
        cell: (info) => <span className="whitespace-nowrap tabular-nums">{formatNumber(info.getValue())} g</span>,
      }),
      column.accessor((b) => b.tankIds.map((id) => codes.get(id) ?? `#${id}`).join(', '), {
        id: 'tanks',
        header: 'Tanks',
        cell: (info) => <span className="block min-w-40 whitespace-normal">{info.getValue() || '—'}</span>,
      }),
      column.accessor('origin', { header: 'Origin' }),
      ...(canEdit
        ? [
            column.display({
              id: 'actions',
              header: 'Actions',
              cell: ({ row }) => <RowActions name="batches" id={row.original.id} label={`batch ${row.original.code}`} onEdit={() => onEdit(row.original)} />,
            }),
          ]
        : []),
    ]
  }, [tanks, canEdit, onEdit])

  const { table, search, setSearch } = useSearchableTable(batches, columns, [{ id: 'arrivalDate', desc: true }])

  return (
    <div className="flex flex-col gap-3">
      <TableToolbar
        search={search}
        onSearch={setSearch}
        searchLabel="Find batches"
        placeholder="Code, species, status, tank or origin"
        shown={table.getFilteredRowModel().rows.length}
        total={batches.length}
        nouns={['batch', 'batches']}
      />
      <DataTable table={table} caption="Batches" minWidth="min-w-[52rem]" emptyText={batches.length ? 'No batch matches.' : 'No batches yet.'} />
    </div>
  )
}
