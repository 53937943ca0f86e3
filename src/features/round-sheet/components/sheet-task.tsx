import { CircleCheck, HeartPulse } from 'lucide-react'
import type { RoundTask } from '#shared/schemas/round'
import { isFinished } from '../utils/group-by-area'
import { clockTime } from '../utils/sheet-format'
import { ReadingBox } from './reading-box'
import { SignBox } from './sign-box'

/** One task on paper: when, where, what, a box per reading, and initials and time. */
export function SheetTask({ task, timeZone }: { task: RoundTask; timeZone: string }) {
  const finished = isFinished(task)
  return (
    <li className="sheet-task flex flex-col gap-1.5 border-t border-tide-300 py-2 first:border-t-0 print:border-tide-900">
      <div className="flex flex-wrap items-baseline gap-x-3 gap-y-0.5">
        <span className="w-12 font-bold tabular-nums text-tide-950">{task.localTime}</span>
        <span className="font-bold text-tide-950">{task.targetLabel}</span>
        <span className="text-tide-900">{task.title}</span>
        {task.priority === 'welfare_critical' && (
          <span className="inline-flex items-center gap-1 text-xs font-semibold text-tide-900">
            <HeartPulse aria-hidden className="size-3.5" /> Welfare-critical
          </span>
        )}
        {task.rationG != null && <span className="text-sm font-semibold text-tide-900">Ration {Math.round(task.rationG)} g</span>}
      </div>
      {task.instructions && <p className="text-xs text-tide-800">{task.instructions}</p>}
      {finished ? (
        <p className="flex items-center gap-1 text-sm text-tide-800">
          <CircleCheck aria-hidden className="size-4" />
          Already {task.status === 'done' ? 'done' : 'skipped'} in Roundtide
          {task.completedAt && ` at ${clockTime(task.completedAt, timeZone)}`}
          {task.completedByName && ` by ${task.completedByName}`}; nothing to write.
        </p>
      ) : (
        <>
          {task.readingSpecs.length > 0 && (
            <div className="grid grid-cols-[repeat(auto-fill,minmax(9.5rem,1fr))] gap-1.5">
              {task.readingSpecs.map((spec) => (
                <ReadingBox key={spec.key} spec={spec} />
              ))}
            </div>
          )}
          <div className="flex flex-wrap gap-x-6 gap-y-1">
            <SignBox label="Initials" className="w-32" />
            <SignBox label="Time" className="w-28" />
            <SignBox label="Note" className="min-w-48 flex-1" />
          </div>
        </>
      )}
    </li>
  )
}
