import { Clock, Crosshair, HeartPulse, UserRound } from 'lucide-react'
import type { ReactNode } from 'react'
import type { Task } from '#shared/schemas/task'
import { formatDay, formatWhen } from '../../../lib/zone-format'
import { BandBadge } from '../../../components/ui/band-badge'
import { TaskStatusLabel } from '../../../components/ui/task-status-label'

function Fact({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div className="flex flex-col gap-0.5">
      <dt className="text-xs font-semibold tracking-wide text-tide-600 uppercase">{label}</dt>
      <dd className="text-tide-900">{children}</dd>
    </div>
  )
}

/** What the task is, where, when, and how it stands now. */
export function TaskSummary({ task, timeZone, readingNames }: { task: Task; timeZone: string; readingNames: Map<string, string> }) {
  return (
    <section aria-label="Task" className="rounded-xl border border-tide-200 bg-white p-4 md:p-5">
      <div className="flex flex-wrap items-center gap-2">
        <TaskStatusLabel status={task.status} />
        {task.flag && <BandBadge band={task.flag} prefix="Flag" />}
        {task.priority === 'welfare_critical' && (
          <span className="inline-flex items-center gap-1 rounded-md bg-alarm-50 px-1.5 py-0.5 text-sm font-semibold text-alarm-700">
            <HeartPulse aria-hidden className="size-4" /> Welfare-critical
          </span>
        )}
      </div>
      <dl className="mt-4 grid gap-4 sm:grid-cols-2 lg:grid-cols-4">
        <Fact label="Target">
          <span className="inline-flex items-center gap-1">
            <Crosshair aria-hidden className="size-4 text-tide-500" /> {task.targetLabel}
          </span>
        </Fact>
        <Fact label="Due">
          <span className="inline-flex items-center gap-1">
            <Clock aria-hidden className="size-4 text-tide-500" /> {formatDay(task.localDate)}, {task.localTime.slice(0, 5)}
          </span>
          <span className="block text-sm text-tide-600">grace until {formatWhen(task.graceUntil, timeZone)}</span>
        </Fact>
        <Fact label="Assignee">
          <span className="inline-flex items-center gap-1">
            <UserRound aria-hidden className="size-4 text-tide-500" /> {task.assigneeName ?? 'Unassigned'}
          </span>
        </Fact>
        <Fact label="Done">
          {task.completedAt ? `${formatWhen(task.completedAt, timeZone)}${task.completedByName ? ` by ${task.completedByName}` : ''}` : 'Not yet'}
          {task.lateMinutes ? <span className="block text-sm text-ember-700">{task.lateMinutes} min late</span> : null}
        </Fact>
      </dl>
      {task.requiredReadings.length > 0 && (
        <p className="mt-4 text-sm text-tide-700">
          <span className="font-semibold">Readings required:</span> {task.requiredReadings.map((key) => readingNames.get(key) ?? key).join(', ')}
        </p>
      )}
      {task.heldReason && <p className="mt-2 text-sm text-tide-700">Held: {task.heldReason}</p>}
      {task.instructions && <p className="mt-2 whitespace-pre-wrap text-sm text-tide-700">{task.instructions}</p>}
    </section>
  )
}
