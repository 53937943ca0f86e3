import { CalendarClock, UtensilsCrossed } from 'lucide-react'
import type { CalendarDay } from '#shared/schemas/board'

/** Arrivals, handlings and fasting windows on a day, each with an icon and words. */
export function DayEvents({ events }: { events: CalendarDay['events'] }) {
  if (!events.length) return null
  return (
    <ul className="flex flex-col gap-0.5">
      {events.map((e) => {
        const Icon = e.kind === 'fasting' ? UtensilsCrossed : CalendarClock
        return (
          <li
            key={`${e.kind}-${e.id}`}
            className={e.kind === 'fasting' ? 'flex items-start gap-1 text-ember-700' : 'flex items-start gap-1 font-semibold text-tide-900'}
          >
            <Icon aria-hidden className="mt-0.5 size-3.5 shrink-0" />
            <span className="min-w-0 break-words">{e.title}</span>
          </li>
        )
      })}
    </ul>
  )
}
