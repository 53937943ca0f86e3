import { CalendarCheck } from 'lucide-react'
import type { RotationResult } from '#shared/schemas/roster'

/** How many weekends each person got, so the planner can see the share is fair. */
export function RotationResultView({ result }: { result: RotationResult }) {
  return (
    <section aria-label="Weekend count per person" className="rounded-lg border border-kelp-100 bg-kelp-50 p-3">
      <p className="flex items-center gap-2 font-semibold text-kelp-700">
        <CalendarCheck aria-hidden className="size-5" /> Planned {result.duties.length} weeks. Weekends on call:
      </p>
      <ul className="mt-2 grid gap-1 sm:grid-cols-2">
        {result.weekendCounts.map((c) => (
          <li key={c.personId} className="flex justify-between gap-3 rounded bg-white px-3 py-1.5 text-tide-900">
            <span>{c.personName}</span>
            <span className="font-semibold">
              {c.weekends} {c.weekends === 1 ? 'weekend' : 'weekends'}
            </span>
          </li>
        ))}
      </ul>
    </section>
  )
}
