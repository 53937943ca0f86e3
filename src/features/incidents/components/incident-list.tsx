import { Link } from 'react-router-dom'
import { deadlineStatuses, nextDeadline } from '#shared/incidents/deadlines'
import type { Incident } from '#shared/schemas/incident'
import { formatWhen } from '../../../lib/zone-format'
import { DeadlineCountdown } from './deadline-countdown'
import { IncidentStatusLabel } from './incident-status-label'

interface Props {
  incidents: Incident[]
  now: Date
  timeZone: string
  tankCodes: Map<number, string>
}

/** Newest noticed first (the server's order), each with its status and the deadline that matters next. */
export function IncidentList({ incidents, now, timeZone, tankCodes }: Props) {
  return (
    <ul aria-label="Incidents" className="flex flex-col gap-2">
      {incidents.map((i) => {
        const deadlines = deadlineStatuses(i, now)
        const next = nextDeadline(deadlines)
        const missed = deadlines.filter((d) => d.state === 'late' || d.state === 'overdue').length
        return (
          <li key={i.id} className="grid gap-1 rounded-xl border border-tide-200 bg-white p-3 md:grid-cols-[1fr_auto] md:gap-x-6">
            <p className="flex flex-wrap items-baseline gap-x-2">
              <Link to={`/incidents/${i.id}`} className="text-base font-bold text-tide-900 underline">
                #{i.id} {i.title}
              </Link>
            </p>
            <div className="md:row-span-2 md:text-right">
              <IncidentStatusLabel status={i.status} />
            </div>
            <p className="text-sm text-tide-700">
              Noticed {formatWhen(i.noticedAt, timeZone)}
              {i.tankIds.length > 0 && ` · ${i.tankIds.map((id) => tankCodes.get(id) ?? `tank ${id}`).join(', ')}`}
              {i.affected > i.dead && ` · ${i.affected} affected`}
              {i.dead > 0 && ` · ${i.dead} dead`}
              {i.source === 'manual' && ' · filed by hand'}
              {missed > 0 && ` · ${missed} deadline${missed === 1 ? '' : 's'} missed`}
            </p>
            <div className="md:col-span-2">
              {next ? (
                <DeadlineCountdown deadline={next} now={now} timeZone={timeZone} />
              ) : (
                <span className="text-sm text-tide-700">{i.status === 'dismissed' ? 'No deadlines: dismissed' : 'Every deadline done'}</span>
              )}
            </div>
          </li>
        )
      })}
    </ul>
  )
}
