import { CircleAlert, CircleCheck, CircleDot, Phone, Users } from 'lucide-react'

/** The icons in the day cells, spelled out once (cells drop the words when narrow). */
export function CalendarLegend() {
  const item = 'inline-flex items-center gap-1'
  return (
    <ul aria-label="Key" className="flex flex-wrap gap-x-4 gap-y-1 text-sm text-tide-700">
      <li className={`${item} text-kelp-700`}>
        <CircleCheck aria-hidden className="size-4" /> done
      </li>
      <li className={item}>
        <CircleDot aria-hidden className="size-4" /> open
      </li>
      <li className={`${item} text-alarm-700`}>
        <CircleAlert aria-hidden className="size-4" /> missed
      </li>
      <li className={item}>
        <Users aria-hidden className="size-4" /> on shift
      </li>
      <li className={item}>
        <Phone aria-hidden className="size-4" /> on call
      </li>
    </ul>
  )
}
