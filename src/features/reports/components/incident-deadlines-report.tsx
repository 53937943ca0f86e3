import { useSuspenseQuery } from '@tanstack/react-query'
import { CircleCheck, CircleX, Clock, Minus } from 'lucide-react'
import type { IncidentReportRow } from '#shared/schemas/animal-report'
import type { DeadlineState } from '#shared/incidents/deadlines'
import { formatWhen } from '../../../lib/zone-format'
import { reportQueries } from '../api/report-queries'
import { csvHref, type DateRange } from '../utils/report-paths'
import { ReportActions } from './report-actions'
import { ReportTable, type ReportColumn } from './report-table'

const STATES: Record<DeadlineState, { label: string; icon: typeof Clock; tone: string }> = {
  met: { label: 'Met', icon: CircleCheck, tone: 'text-tide-700' },
  late: { label: 'Missed, done late', icon: CircleX, tone: 'text-alarm-700' },
  overdue: { label: 'Missed, not done', icon: CircleX, tone: 'text-alarm-700' },
  due: { label: 'Due', icon: Clock, tone: 'text-ember-700' },
  not_needed: { label: 'Not needed', icon: Minus, tone: 'text-tide-700' },
}

const STATUS: Record<string, string> = { proposed: 'Proposed', open: 'Open', reported: 'Reported', closed: 'Closed', dismissed: 'Dismissed' }

function Deadline({ state, dueAt, doneAt, zone }: { state: DeadlineState; dueAt: string; doneAt: string; zone: string }) {
  const s = STATES[state]
  return (
    <span className="flex flex-col">
      <span className={`inline-flex items-center gap-1 font-semibold ${s.tone}`}>
        <s.icon aria-hidden className="size-4" /> {s.label}
      </span>
      <span className="text-xs text-tide-800">
        by {formatWhen(dueAt, zone)}
        {doneAt ? ` · done ${formatWhen(doneAt, zone)}` : ''}
      </span>
    </span>
  )
}

const columns = (zone: string): ReadonlyArray<ReportColumn<IncidentReportRow>> => [
  { label: 'Incident', cell: (r) => `#${r.id}` },
  { label: 'What', cell: (r) => r.title, wrap: true },
  { label: 'Status', cell: (r) => STATUS[r.status] ?? r.status },
  { label: 'Noticed', cell: (r) => formatWhen(r.noticedAt, zone) },
  { label: 'Tanks', cell: (r) => r.tanks || '—' },
  { label: 'Affected', cell: (r) => r.affected, numeric: true },
  { label: 'Dead', cell: (r) => r.dead, numeric: true },
  { label: 'Welfare officer told', cell: (r) => <Deadline state={r.welfare} dueAt={r.welfareDueAt} doneAt={r.welfareDoneAt} zone={zone} /> },
  { label: 'Committee told', cell: (r) => <Deadline state={r.committee} dueAt={r.committeeDueAt} doneAt={r.committeeDoneAt} zone={zone} /> },
  { label: 'Full report', cell: (r) => <Deadline state={r.report} dueAt={r.reportDueAt} doneAt={r.reportDoneAt} zone={zone} /> },
]

/** The period's incidents (dismissed proposals left out) with each of the three deadlines met or missed. */
export function IncidentDeadlinesReport({ range, timeZone }: { range: DateRange; timeZone: string }) {
  const { data: rows } = useSuspenseQuery(reportQueries.incidents(range))
  const missed = rows.filter((r) => [r.welfare, r.committee, r.report].some((s) => s === 'late' || s === 'overdue')).length
  return (
    <section aria-labelledby="incident-deadlines-heading" className="flex flex-col gap-3 print:break-before-auto">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <h2 id="incident-deadlines-heading" className="text-xl font-bold text-tide-900">
          Incidents and their deadlines
        </h2>
        <ReportActions csvHref={csvHref('incidents', range)} label="incidents and deadlines" />
      </div>
      <p className="text-sm text-tide-800">
        {rows.length} incidents · {missed ? `${missed} with a deadline missed` : 'every deadline met so far'}
      </p>
      <ReportTable
        caption="Incidents and their deadlines"
        columns={columns(timeZone)}
        rows={rows}
        rowKey={(r) => String(r.id)}
        emptyText="No incidents noticed in this range."
      />
    </section>
  )
}
