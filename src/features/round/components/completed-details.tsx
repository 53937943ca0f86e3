import { RotateCcw } from 'lucide-react'
import type { CompletionResult } from '#shared/schemas/completion'
import type { Round, RoundTask } from '#shared/schemas/round'
import { DERIVED_NAMES } from '../utils/derived-names'
import { doneAt } from '../utils/format'
import { BandBadge } from '../../../components/ui/band-badge'

interface Props {
  task: RoundTask
  round: Round
  result?: CompletionResult
}

/** Who finished the task and when; for a flag, the readings behind it and when the recheck is due. */
export function CompletedDetails({ task, round, result }: Props) {
  const recheck = round.tasks.find((t) => t.recheckOfTaskId === task.id)
  const names = new Map([...Object.entries(DERIVED_NAMES).map(([k, d]) => [k, d.name] as const), ...task.readingSpecs.map((s) => [s.key, s.name] as const)])
  const flagged = result?.readings.filter((r) => r.band !== 'ok') ?? []
  return (
    <div className="flex flex-col gap-2 text-tide-800">
      <p>
        {task.status === 'done' ? 'Done' : "Marked can't do"} by <strong>{task.completedByName ?? 'someone'}</strong>
        {task.completedAt && <> at {doneAt(task.completedAt, round.timeZone, round.date)}</>}
        {task.lateMinutes ? <span className="text-ember-700"> ({task.lateMinutes} min late)</span> : null}
      </p>
      {task.flag === 'critical' && (
        <p className="font-semibold text-alarm-700">A critical reading starts the escalation at once. Act on it now, then recheck.</p>
      )}
      {flagged.length > 0 && (
        <ul className="flex flex-col gap-1">
          {flagged.map((r) => (
            <li key={r.parameterKey} className="flex flex-wrap items-center gap-2">
              <BandBadge band={r.band} ringed />
              {names.get(r.parameterKey) ?? r.parameterKey} {r.value} {r.unit}
            </li>
          ))}
        </ul>
      )}
      {(recheck || result?.recheckTaskId) && (
        <p role="status" className="flex items-center gap-2 font-semibold text-tide-900">
          <RotateCcw aria-hidden className="size-5 shrink-0" />
          {recheck ? `Recheck due at ${recheck.localTime}` : 'A recheck task was made'}
        </p>
      )}
      {result?.notes.map((note) => (
        <p key={note} className="text-sm text-tide-600">
          {note}
        </p>
      ))}
    </div>
  )
}
