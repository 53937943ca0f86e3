import { weekOf } from '../utils/board-dates'
import { WeekDay } from './week-day'

interface Props {
  date: string
  today: string
  canMove: boolean
  dragging: boolean
  hrefFor: (date: string) => string
}

export function WeekStrip({ date, today, canMove, dragging, hrefFor }: Props) {
  return (
    <nav aria-label="Days of this week">
      <ol className="grid grid-cols-7 gap-1.5">
        {weekOf(date).map((day) => (
          <WeekDay
            key={day}
            date={day}
            href={hrefFor(day)}
            current={day === date}
            today={day === today}
            droppable={canMove && day >= today}
            dragging={dragging}
          />
        ))}
      </ol>
    </nav>
  )
}
