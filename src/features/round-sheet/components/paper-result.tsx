import { CircleCheck, OctagonAlert, TriangleAlert } from 'lucide-react'
import type { CompletionResult } from '#shared/schemas/completion'
import { clockTime } from '../utils/sheet-format'

/** What the server made of a typed-in task: saved, and flagged if a reading was out of range. */
export function PaperResult({ result, timeZone }: { result: CompletionResult; timeZone: string }) {
  const { task } = result
  const flagged = result.readings.filter((r) => r.band !== 'ok')
  return (
    <div role="status" className="flex flex-col gap-1 rounded-lg bg-kelp-50 p-3 text-sm text-kelp-700">
      <p className="flex items-center gap-1.5 font-semibold">
        <CircleCheck aria-hidden className="size-4" /> Saved: done at {task.completedAt ? clockTime(task.completedAt, timeZone) : '—'}
        {task.completedByName && ` by ${task.completedByName}`}
        {task.lateMinutes ? `, ${task.lateMinutes} min late` : ''}
      </p>
      {task.flag && (
        <p className={`flex items-center gap-1.5 font-semibold ${task.flag === 'critical' ? 'text-alarm-700' : 'text-ember-700'}`}>
          {task.flag === 'critical' ? <OctagonAlert aria-hidden className="size-4" /> : <TriangleAlert aria-hidden className="size-4" />}
          Flag: {task.flag === 'critical' ? 'Critical' : 'Watch'} ({flagged.map((r) => `${r.parameterKey} ${r.value} ${r.unit}`).join(', ')}). Kept on record; a
          sheet typed in later raises no recheck.
        </p>
      )}
    </div>
  )
}
