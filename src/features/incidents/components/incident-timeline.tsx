import { AlarmClock, Ban, CircleCheck, CircleDot, Flag, MessageSquare, Phone, Send, Siren, type LucideIcon } from 'lucide-react'
import type { DeadlineStatus } from '#shared/incidents/deadlines'
import type { Incident } from '#shared/schemas/incident'
import { formatWhen } from '../../../lib/zone-format'
import { incidentTimeline, type TimelineKind } from '../utils/timeline'
import { deadlineText } from './deadline-countdown'

const ICONS: Record<TimelineKind, LucideIcon> = {
  started: CircleDot,
  proposed: Siren,
  confirmed: CircleCheck,
  dismissed: Ban,
  told: Phone,
  note: MessageSquare,
  reported: Send,
  closed: Flag,
  escalated: AlarmClock,
  deadline: AlarmClock,
}

/** The incident's story in time order, with each deadline placed where it falls: met, missed or still ahead. */
export function IncidentTimeline({ incident, deadlines, now, timeZone }: { incident: Incident; deadlines: DeadlineStatus[]; now: Date; timeZone: string }) {
  const entries = incidentTimeline(incident, deadlines)
  return (
    <ol aria-label="Timeline" className="flex flex-col border-l-2 border-tide-200 pl-4">
      {entries.map((e, n) => {
        const Icon = ICONS[e.kind]
        // Only a deadline lies ahead; a note stamped by the server a moment after the last tick is not.
        const ahead = e.kind === 'deadline' && new Date(e.at).getTime() > now.getTime()
        return (
          <li key={n} className="relative pb-3">
            <Icon aria-hidden className="absolute top-0.5 -left-[27px] size-5 rounded-full bg-white text-tide-600" />
            <p className="text-sm text-tide-600">
              <time dateTime={e.at}>{formatWhen(e.at, timeZone)}</time>
              {ahead && ' (ahead)'}
            </p>
            <p className="font-semibold text-tide-900">{e.title}</p>
            {e.deadline && (
              <p className={e.deadline.state === 'overdue' || e.deadline.state === 'late' ? 'text-sm font-bold text-alarm-700' : 'text-sm text-tide-800'}>
                {deadlineText(e.deadline, now, timeZone)}
              </p>
            )}
            {e.text && <p className="text-sm whitespace-pre-line text-tide-800">{e.text}</p>}
          </li>
        )
      })}
    </ol>
  )
}
