import { CalendarRange } from 'lucide-react'
import { Link } from 'react-router-dom'
import type { TankOverview } from '#shared/schemas/tank-page'
import { formatLocalDay } from '../utils/format'

const STATUS: Record<string, string> = { planned: 'Planned', ended: 'Ended', cancelled: 'Cancelled' }

/** Arrivals, treatments, dispatches and other events that touched this tank. */
export function EventList({ events }: { events: TankOverview['events'] }) {
  if (events.length === 0) return <p className="rounded-xl border border-dashed border-tide-300 bg-white p-4 text-tide-700">No events for this tank.</p>
  return (
    <ul aria-label="Events" className="divide-y divide-tide-100 rounded-xl border border-tide-200 bg-white">
      {events.map((e) => (
        <li key={e.id} className="flex flex-wrap items-center gap-x-3 gap-y-0.5 px-3 py-2 text-sm">
          <CalendarRange aria-hidden className="size-4 text-tide-600" />
          <span className="w-36 tabular-nums text-tide-700">
            {formatLocalDay(e.localStart)} {e.localStart.slice(11, 16)}
          </span>
          <Link to={`/events/${e.id}`} className="font-semibold text-tide-900 underline">
            {e.title}
          </Link>
          <span className="text-tide-700">
            {e.kind} · {STATUS[e.status] ?? e.status}
          </span>
        </li>
      ))}
    </ul>
  )
}
