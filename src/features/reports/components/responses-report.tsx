import { useSuspenseQuery } from '@tanstack/react-query'
import { reportQueries } from '../api/report-queries'
import type { ResponseRow } from '#shared/schemas/report'
import { csvHref, type DateRange } from '../utils/report-paths'
import { FlagText } from './flag-text'
import { ReportActions } from './report-actions'
import { ReportTable, type ReportColumn } from './report-table'

const minutes = (m: number | null) => (m === null ? '—' : `${m} min`)
const ALERTS: Record<string, string> = { missed_task: 'Missed task', critical_reading: 'Critical reading' }

const COLUMNS: ReadonlyArray<ReportColumn<ResponseRow>> = [
  { label: 'Date', cell: (r) => r.date },
  { label: 'Due', cell: (r) => r.time },
  { label: 'Task', cell: (r) => r.task, wrap: true },
  { label: 'Where', cell: (r) => r.where, wrap: true },
  { label: 'Flag', cell: (r) => <FlagText flag={r.flag} /> },
  { label: 'Escalation', cell: (r) => (r.alert ? (ALERTS[r.alert] ?? r.alert) : 'None') },
  { label: 'Answered by', cell: (r) => r.acknowledgedBy || (r.alert ? 'Not answered' : '—') },
  { label: 'To answer', cell: (r) => minutes(r.minutesToAcknowledge), numeric: true },
  { label: 'Recheck', cell: (r) => r.recheckStatus || '—' },
  { label: 'To recheck', cell: (r) => minutes(r.minutesToRecheck), numeric: true },
]

function median(values: Array<number | null>) {
  const v = values.filter((x): x is number => x !== null).sort((a, b) => a - b)
  if (v.length === 0) return null
  const mid = Math.floor(v.length / 2)
  return v.length % 2 ? v[mid] : Math.round((v[mid - 1] + v[mid]) / 2)
}

/** How fast flags and escalations were answered: escalation to answer, flag to recheck done. */
export function ResponsesReport({ range }: { range: DateRange }) {
  const { data: rows } = useSuspenseQuery(reportQueries.responses(range))
  const toAnswer = median(rows.map((r) => r.minutesToAcknowledge))
  const toRecheck = median(rows.map((r) => r.minutesToRecheck))
  return (
    <section aria-labelledby="responses-heading" className="flex flex-col gap-3">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <h2 id="responses-heading" className="text-xl font-bold text-tide-900">
          Response to flags and escalations
        </h2>
        <ReportActions csvHref={csvHref('responses', range)} label="responses" />
      </div>
      <dl className="grid grid-cols-3 gap-3 text-sm">
        {[
          ['Flags and misses', String(rows.length)],
          ['Median time to answer', minutes(toAnswer)],
          ['Median time to recheck', minutes(toRecheck)],
        ].map(([label, value]) => (
          <div key={label} className="rounded-xl border border-tide-200 bg-white p-3">
            <dt className="text-tide-700">{label}</dt>
            <dd className="text-xl font-bold tabular-nums text-tide-900">{value}</dd>
          </div>
        ))}
      </dl>
      <ReportTable
        caption="Responses"
        columns={COLUMNS}
        rows={rows}
        rowKey={(r, i) => `${r.date}-${r.time}-${r.task}-${i}`}
        emptyText="No flags or missed tasks in this range."
      />
    </section>
  )
}
