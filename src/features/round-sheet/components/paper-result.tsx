import { CircleCheck, OctagonAlert, TriangleAlert } from 'lucide-react'
import type { CompletionResult } from '#shared/schemas/completion'
import type { ReadingSpec } from '#shared/schemas/round'
import { BAND_LOOK } from '../../../components/ui/band-badge'
import { clockTime } from '../utils/sheet-format'

/** What the server made of a typed-in task: saved, and flagged if a reading was out of range. */
// Worked out by the server, so not among the task's reading specs.
const DERIVED_NAMES: Record<string, string> = { do_pct: 'DO saturation', nh3_mgL: 'Un-ionised ammonia-N' }

export function PaperResult({ result, specs, timeZone }: { result: CompletionResult; specs: ReadingSpec[]; timeZone: string }) {
  const { task } = result
  const name = (key: string) => specs.find((s) => s.key === key)?.name ?? DERIVED_NAMES[key] ?? key
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
          Flag: {BAND_LOOK[task.flag].label} ({flagged.map((r) => `${name(r.parameterKey)} ${r.value} ${r.unit}`).join(', ')}). Kept on record; a sheet typed in
          later raises no recheck.
        </p>
      )}
    </div>
  )
}
