import { useDroppable } from '@dnd-kit/core'
import { clsx } from 'clsx'
import { Link } from 'react-router-dom'
import { dayOfMonth, longDay, shortWeekday } from '../utils/board-dates'
import { dayId, type DropTarget } from '../utils/drop-targets'

interface Props {
  date: string
  href: string
  current: boolean
  today: boolean
  /** Past days take no cards, and read-only boards take none at all. */
  droppable: boolean
  dragging: boolean
}

/** One day of the week strip: a link to that day's board, and a drop target to move cards there. */
export function WeekDay({ date, href, current, today, droppable, dragging }: Props) {
  const target: DropTarget = { kind: 'day', date }
  const { setNodeRef, isOver } = useDroppable({ id: dayId(date), data: target, disabled: !droppable || current })
  const inviting = dragging && droppable && !current

  return (
    <li ref={setNodeRef} className="min-w-0">
      <Link
        to={href}
        aria-current={current ? 'date' : undefined}
        aria-label={`${longDay(date)}${today ? ', today' : ''}`}
        className={clsx(
          'flex min-h-11 flex-col items-center justify-center rounded-lg px-1 py-1 text-center ring-1 transition-colors',
          current ? 'bg-tide-700 text-white ring-tide-700' : 'bg-white text-tide-800 ring-tide-200 hover:bg-tide-50',
          // An outline takes no room: a border here moved the columns when a drag began.
          inviting && 'outline-2 -outline-offset-2 outline-dashed outline-tide-400',
          isOver && 'bg-tide-100 ring-2 ring-tide-600',
        )}
      >
        <span className="text-xs font-semibold uppercase tracking-wide">{shortWeekday(date)}</span>
        <span className="text-lg leading-tight font-bold tabular-nums">{dayOfMonth(date)}</span>
        {today && <span className={clsx('text-xs font-semibold', current ? 'text-tide-100' : 'text-tide-600')}>Today</span>}
        {isOver && <span className="text-xs font-bold">Move here</span>}
      </Link>
    </li>
  )
}
