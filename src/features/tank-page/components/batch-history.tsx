import { Link } from 'react-router-dom'
import type { TankOverview } from '#shared/schemas/tank-page'
import { formatLocalDay, formatWhen } from '../utils/format'

const STATUS: Record<TankOverview['batches'][number]['status'], string> = {
  quarantine: 'In quarantine',
  active: 'Active',
  dispatched: 'Dispatched',
  ended: 'Ended',
}
const RECORD: Record<string, string> = {
  transport_box: 'Transport box check',
  transport_water: 'Transport water test',
  weighing: 'Weighing',
  bath: 'Bath',
  note: 'Note',
  review: 'Review',
}

/** Every batch this tank has held, newest arrival first, and the latest entries on their records. */
export function BatchHistory({ overview, timeZone }: { overview: TankOverview; timeZone: string }) {
  const batches = [...overview.batches].sort((a, b) => b.arrivalDate.localeCompare(a.arrivalDate))
  const code = new Map(batches.map((b) => [b.id, b.code]))
  if (batches.length === 0) return <p className="rounded-xl border border-dashed border-tide-300 bg-white p-4 text-tide-700">No batch has been in this tank.</p>
  return (
    <div className="flex flex-col gap-3">
      <ul className="grid gap-2 md:grid-cols-2">
        {batches.map((b) => (
          <li key={b.id} className="rounded-xl border border-tide-200 bg-white p-3 text-sm">
            <p className="flex flex-wrap items-baseline justify-between gap-2">
              <Link to={`/batches/${b.id}`} className="text-base font-bold text-tide-900 underline">
                {b.code}
              </Link>
              <span className="font-semibold text-tide-700">{STATUS[b.status]}</span>
            </p>
            <p className="text-tide-800">
              {b.species}
              {b.origin && ` · from ${b.origin}`}
            </p>
            <p className="text-tide-700">
              Arrived {formatLocalDay(b.arrivalDate)} · {b.count} fish · mean {b.meanWeightG} g
            </p>
          </li>
        ))}
      </ul>
      {overview.batchRecords.length > 0 && (
        <div>
          <h3 className="text-sm font-semibold text-tide-900">Latest batch records</h3>
          <ul className="mt-1 flex flex-col gap-0.5 text-sm text-tide-800">
            {overview.batchRecords.slice(0, 8).map((r) => (
              <li key={r.id}>
                {formatWhen(r.createdAt, timeZone)} · {code.get(r.batchId) ?? `Batch ${r.batchId}`} · {RECORD[r.kind] ?? r.kind}
              </li>
            ))}
          </ul>
        </div>
      )}
    </div>
  )
}
