import type { DeadlineStatus } from '#shared/incidents/deadlines'
import { DeadlineCountdown } from './deadline-countdown'

/** The three deadlines from the facility's settings, counting down (common practice; local codes decide). */
export function IncidentDeadlines({ deadlines, now, timeZone }: { deadlines: DeadlineStatus[]; now: Date; timeZone: string }) {
  return (
    <section aria-label="Deadlines" className="flex flex-col gap-2 rounded-xl border border-tide-200 bg-white p-4">
      <h2 className="text-lg font-bold text-tide-900">Deadlines</h2>
      <ul className="flex flex-col gap-1.5">
        {deadlines.map((d) => (
          <li key={d.key}>
            <DeadlineCountdown deadline={d} now={now} timeZone={timeZone} />
          </li>
        ))}
      </ul>
      <p className="text-xs text-tide-600">
        Hours from the facility’s settings, counted from when the incident was noticed. Your local animal-ethics code decides what is required.
      </p>
    </section>
  )
}
