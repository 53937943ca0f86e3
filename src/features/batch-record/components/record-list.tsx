import { TriangleAlert } from 'lucide-react'
import { Link } from 'react-router-dom'
import type { BatchRecord } from '#shared/schemas/batch-record'
import { describeRecord } from '../utils/record-text'
import { formatInstant } from '../utils/zone-format'

/** The batch's record, newest first: who recorded what, when, and any warning it carried. */
export function RecordList({ records, zone }: { records: BatchRecord[]; zone: string }) {
  if (records.length === 0)
    return <p className="rounded-xl border border-dashed border-tide-300 bg-white p-4 text-tide-700">Nothing recorded for this batch yet.</p>
  return (
    <ol aria-label="Batch record" className="divide-y divide-tide-100 rounded-xl border border-tide-200 bg-white">
      {[...records].reverse().map((r) => {
        const text = describeRecord(r)
        return (
          <li key={r.id} className="flex flex-col gap-1 px-4 py-3">
            <p className="flex flex-wrap items-baseline justify-between gap-x-3">
              <span className="font-semibold text-tide-900">{text.title}</span>
              <span className="text-sm text-tide-600">
                {formatInstant(r.createdAt, zone)} · {r.personName}
              </span>
            </p>
            {text.lines.map((line, i) => (
              <p key={i} className="text-sm break-words text-tide-800">
                {line}
              </p>
            ))}
            {text.warnings.map((w) => (
              <p key={w} className="flex items-start gap-2 text-sm text-tide-900">
                <TriangleAlert aria-hidden className="mt-0.5 size-4 shrink-0 text-ember-700" />{' '}
                <span>
                  <strong className="text-ember-700">Warning:</strong> {w}
                </span>
              </p>
            ))}
            {r.eventId !== null && (
              <Link to={`/events/${r.eventId}`} className="text-sm font-semibold text-tide-700 underline">
                From the event
              </Link>
            )}
          </li>
        )
      })}
    </ol>
  )
}
