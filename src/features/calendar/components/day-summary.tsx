import { clsx } from 'clsx'
import { Phone, Users } from 'lucide-react'
import type { CalendarDay } from '#shared/schemas/board'
import { CATEGORY_LABELS, type Category } from '#shared/schemas/routine'
import { DayEvents } from './day-events'
import { PeopleLine } from './people-line'
import { StatusCounts } from './status-counts'

interface Props {
  dayNumber: string
  day: CalendarDay | undefined
  /** The week view has room for every category and name. */
  roomy: boolean
}

const topCategories = (byCategory: Record<string, number>, n: number) =>
  Object.entries(byCategory)
    .sort(([a, x], [b, y]) => y - x || a.localeCompare(b))
    .slice(0, n)
    .map(([c, count]) => `${CATEGORY_LABELS[c as Category] ?? c} ${count}`)

/** What one calendar day holds: task counts by status, the busiest categories, who is on shift and on call. */
export function DaySummary({ dayNumber, day, roomy }: Props) {
  const total = day ? Object.values(day.counts).reduce((a, b) => a + b, 0) : 0
  return (
    <div className={clsx('@container flex w-full flex-col gap-0.5 text-left leading-snug font-normal text-tide-800', roomy ? 'text-sm' : 'text-xs')}>
      <span className="flex items-baseline justify-between gap-1">
        <span className="text-sm font-bold text-tide-900">{dayNumber}</span>
        {total > 0 && <span className="text-tide-600 @max-[7.5rem]:hidden">{total === 1 ? '1 task' : `${total} tasks`}</span>}
      </span>
      {day && <DayEvents events={day.events} />}
      {day && total > 0 && <StatusCounts counts={day.counts} />}
      {day && total > 0 && (
        <p className="flex flex-wrap gap-x-1.5 text-tide-700 @max-[6rem]:hidden">
          {topCategories(day.byCategory, roomy ? 6 : 2).map((c) => (
            <span key={c} className="whitespace-nowrap">
              {c}
            </span>
          ))}
        </p>
      )}
      {day && (
        <div className="flex flex-col gap-0.5 break-words">
          <PeopleLine icon={Users} label="On shift" names={day.onShift} limit={roomy ? undefined : 2} />
          <PeopleLine icon={Phone} label="On call" names={day.onCall} limit={roomy ? undefined : 2} />
        </div>
      )}
    </div>
  )
}
