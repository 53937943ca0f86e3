import { useSuspenseQuery } from '@tanstack/react-query'
import type { StockReportRow } from '#shared/schemas/animal-report'
import { catalogueQueries } from '../../../api/catalogues'
import { reportQueries } from '../api/report-queries'
import { csvHref, type StockFilter } from '../utils/report-paths'
import { BalanceSummary } from './balance-summary'
import { ReportActions } from './report-actions'
import { ReportSelect } from './report-select'
import { ReportTable, type ReportColumn } from './report-table'

const num = (label: string, value: (r: StockReportRow) => number): ReportColumn<StockReportRow> => ({
  label,
  cell: (r) => value(r).toLocaleString('en-GB'),
  numeric: true,
})

const COLUMNS: ReadonlyArray<ReportColumn<StockReportRow>> = [
  { label: 'Batch · tank', cell: (r) => (r.tankId === null ? `${r.batchCode} · all tanks` : `${r.batchCode} · ${r.tank}`) },
  num('At start', (r) => r.opening),
  num('In', (r) => r.arrived),
  num('Moved in', (r) => r.movedIn),
  num('Moved out', (r) => r.movedOut),
  num('Died', (r) => r.died),
  { label: 'Causes', cell: (r) => r.diedByCause || '—', wrap: true },
  num('Culled', (r) => r.culled),
  num('Used (sampled)', (r) => r.used),
  num('Out', (r) => r.dispatched),
  num('Corrected', (r) => r.corrected),
  num('On hand', (r) => r.closing),
  { label: 'Register', cell: (r) => (r.balanced ? 'Agrees' : 'Differs') },
]

interface StockReportProps {
  filter: StockFilter
  onBatchChange: (batchId: string) => void
}

/** Per batch and tank: the period's numbers, each batch's sum written out and checked against the register. */
export function StockReport({ filter, onBatchChange }: StockReportProps) {
  const { data: rows } = useSuspenseQuery(reportQueries.stock(filter))
  const { data: batches } = useSuspenseQuery(catalogueQueries.batches())
  const totals = rows.filter((r) => r.tankId === null)
  const options = [{ value: '', label: 'All batches' }, ...batches.map((b) => ({ value: String(b.id), label: `${b.code} · ${b.species}` }))]
  return (
    <section aria-labelledby="stock-heading" className="flex flex-col gap-3">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <h2 id="stock-heading" className="text-xl font-bold text-tide-900">
          Numbers per batch
        </h2>
        <ReportActions csvHref={csvHref('stock', filter)} label="numbers per batch" />
      </div>
      <div className="max-w-sm print:hidden">
        <ReportSelect label="Batch" value={filter.batchId} options={options} onChange={onBatchChange} />
      </div>
      {totals.length === 0 ? (
        <p className="rounded-xl border border-tide-200 bg-white p-4 text-tide-800">No fish on the register in this range.</p>
      ) : (
        <ul aria-label="Balance per batch" className="grid gap-2 md:grid-cols-2">
          {totals.map((row) => (
            <BalanceSummary key={row.batchId} row={row} />
          ))}
        </ul>
      )}
      <ReportTable
        caption="Numbers per batch and tank"
        columns={COLUMNS}
        rows={rows}
        rowKey={(r) => `${r.batchId}-${r.tankId ?? 'all'}`}
        emptyText="No movements in this range."
      />
    </section>
  )
}
