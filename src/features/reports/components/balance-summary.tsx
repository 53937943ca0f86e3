import { CircleCheck, CircleX } from 'lucide-react'
import type { StockReportRow } from '#shared/schemas/animal-report'

const n = (value: number) => value.toLocaleString('en-GB')

/** A batch's sum written out: what it began with, what came and went, and what it ended with. */
export function BalanceSummary({ row }: { row: StockReportRow }) {
  const out = [
    ['died', row.died],
    ['culled', row.culled],
    ['used', row.used],
    ['out', row.dispatched],
  ] as const
  const corrected = row.corrected ? ` ${row.corrected > 0 ? '+' : '−'} ${n(Math.abs(row.corrected))} corrected` : ''
  const sum = `${n(row.opening)} at the start + ${n(row.arrived)} in ${out.map(([label, v]) => `− ${n(v)} ${label}`).join(' ')}${corrected} = ${n(row.closing)} on hand`
  return (
    <li className="flex flex-col gap-1 rounded-xl border border-tide-200 bg-white p-3 print:break-inside-avoid print:border-tide-300">
      <p className="font-semibold text-tide-900">
        {row.batchCode} <span className="font-normal text-tide-700">· {row.species}</span>
      </p>
      <p className="tabular-nums text-tide-900">{sum}</p>
      <p className="text-sm text-tide-800">
        {n(row.movedIn)} moved between its tanks{row.diedByCause ? ` · deaths by cause: ${row.diedByCause}` : ''}
      </p>
      {row.balanced ? (
        <p className="inline-flex items-center gap-1 text-sm font-semibold text-tide-700">
          <CircleCheck aria-hidden className="size-4" /> Balances: the register holds {n(row.closing)} at the end, and moves between tanks cancel
        </p>
      ) : (
        <p className="inline-flex items-center gap-1 text-sm font-semibold text-alarm-700">
          <CircleX aria-hidden className="size-4" /> Does not balance with the register: ask a supervisor to check the movements
        </p>
      )}
    </li>
  )
}
