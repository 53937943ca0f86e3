import { clsx } from 'clsx'
import { CircleAlert, CircleCheck, CircleDot, CirclePause, type LucideIcon } from 'lucide-react'
import type { CalendarDay } from '#shared/schemas/board'

const LOOK: Array<{ key: keyof CalendarDay['counts']; label: string; icon: LucideIcon; tone: string; always?: boolean }> = [
  { key: 'done', label: 'done', icon: CircleCheck, tone: 'text-kelp-700', always: true },
  { key: 'open', label: 'open', icon: CircleDot, tone: 'text-tide-800', always: true },
  { key: 'missed', label: 'missed', icon: CircleAlert, tone: 'text-alarm-700 font-bold' },
  { key: 'held', label: 'held', icon: CirclePause, tone: 'text-tide-700' },
]

/** Done, open and (when any) missed and held, each as icon + number + word. */
export function StatusCounts({ counts }: { counts: CalendarDay['counts'] }) {
  return (
    <ul className="flex flex-wrap gap-x-2 gap-y-0.5">
      {LOOK.filter((l) => l.always || counts[l.key] > 0).map((l) => (
        <li key={l.key} className={clsx('inline-flex items-center gap-0.5 whitespace-nowrap', l.tone)}>
          <l.icon aria-hidden className="size-3.5 shrink-0" />
          <span className="tabular-nums">{counts[l.key]}</span> <span className="@max-[7.5rem]:sr-only">{l.label}</span>
        </li>
      ))}
    </ul>
  )
}
