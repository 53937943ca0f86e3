import { clsx } from 'clsx'
import { AlarmClock, Ban, CircleCheck, CircleX, Hourglass, type LucideIcon } from 'lucide-react'
import { DEADLINE_LABELS, type DeadlineState, type DeadlineStatus } from '#shared/incidents/deadlines'
import { formatWhen } from '../../../lib/zone-format'
import { spanText } from '../utils/countdown'

const LOOK: Record<DeadlineState, { icon: LucideIcon; tone: string }> = {
  due: { icon: Hourglass, tone: 'text-tide-800' },
  overdue: { icon: AlarmClock, tone: 'text-alarm-700' },
  met: { icon: CircleCheck, tone: 'text-kelp-700' },
  late: { icon: CircleX, tone: 'text-alarm-700' },
  not_needed: { icon: Ban, tone: 'text-tide-600' },
}

export function deadlineText(d: DeadlineStatus, now: Date, timeZone: string): string {
  const due = new Date(d.dueAt).getTime()
  switch (d.state) {
    case 'due':
      return `${spanText(due - now.getTime())} left (by ${formatWhen(d.dueAt, timeZone)})`
    case 'overdue':
      return `Overdue by ${spanText(now.getTime() - due)} (was due ${formatWhen(d.dueAt, timeZone)})`
    case 'met':
      return `Met on ${formatWhen(d.doneAt!, timeZone)}`
    case 'late':
      return `Missed: done ${spanText(new Date(d.doneAt!).getTime() - due)} late`
    case 'not_needed':
      return 'Not needed: the proposal was dismissed'
  }
}

/** One deadline as icon and words that count down live; overdue says so in words, not colour alone. */
export function DeadlineCountdown({
  deadline,
  now,
  timeZone,
  withLabel = true,
}: {
  deadline: DeadlineStatus
  now: Date
  timeZone: string
  withLabel?: boolean
}) {
  const look = LOOK[deadline.state]
  return (
    <span
      className={clsx(
        'inline-flex items-start gap-1 text-sm',
        look.tone,
        deadline.state === 'overdue' || deadline.state === 'late' ? 'font-bold' : 'font-semibold',
      )}
    >
      <look.icon aria-hidden className="mt-0.5 size-4 shrink-0" />
      <span>
        {withLabel && <span className="text-tide-900">{DEADLINE_LABELS[deadline.key]}: </span>}
        <span className="tabular-nums">{deadlineText(deadline, now, timeZone)}</span>
      </span>
    </span>
  )
}
