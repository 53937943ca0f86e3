import { CalendarX, CircleCheck, HeartPulse, PhoneOff, UsersRound, type LucideIcon } from 'lucide-react'
import { Link } from 'react-router-dom'
import type { CoverageWarning } from '#shared/schemas/roster'
import { dayMonth, weekdayShort } from '../utils/roster-dates'

const LOOK: Record<CoverageWarning['kind'], { label: string; icon: LucideIcon }> = {
  tasks_without_shift: { label: 'Nobody on shift', icon: CalendarX },
  no_one_on_call: { label: 'Gap in on-call', icon: PhoneOff },
  double_booked: { label: 'Double-booked', icon: UsersRound },
  welfare_task_off_shift: { label: 'Welfare-critical task off shift', icon: HeartPulse },
}

/** Gaps in the visible range that someone must fix before the day comes. */
export function CoverageWarnings({ warnings }: { warnings: CoverageWarning[] }) {
  if (warnings.length === 0) {
    return (
      <p className="flex items-center gap-2 rounded-xl border border-kelp-100 bg-kelp-50 p-3 font-semibold text-kelp-700">
        <CircleCheck aria-hidden className="size-5" /> No coverage gaps in these days.
      </p>
    )
  }
  return (
    <section aria-labelledby="coverage-heading" className="rounded-xl border border-ember-100 bg-ember-50 p-3">
      <h2 id="coverage-heading" className="font-bold text-ember-700">
        {warnings.length} coverage {warnings.length === 1 ? 'warning' : 'warnings'}
      </h2>
      <ul className="mt-2 flex max-h-64 flex-col gap-1 overflow-y-auto">
        {warnings.map((w, i) => {
          const look = LOOK[w.kind]
          return (
            <li key={i} className="flex items-start gap-2 text-sm text-tide-900">
              <look.icon aria-hidden className="mt-0.5 size-4 shrink-0 text-ember-700" />
              <span>
                <span className="font-semibold">
                  {weekdayShort(w.date)} {dayMonth(w.date)} · {look.label}:
                </span>{' '}
                {w.message}
                {w.taskId && (
                  <>
                    {' '}
                    ·{' '}
                    <Link to={`/tasks/${w.taskId}`} className="font-semibold text-tide-700 underline">
                      task
                    </Link>
                  </>
                )}
              </span>
            </li>
          )
        })}
      </ul>
    </section>
  )
}
