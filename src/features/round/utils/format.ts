import { longDay } from '../../../lib/day-names'
import { clockTime, dateFormat } from '../../../lib/zone-format'

export { clockTime }

/** "Wednesday 2 December" for a facility date (YYYY-MM-DD); names by hand, as the header is drawn on the first frame. */
export const longDate = longDay

/** A time for "done at", with the date only when it is not the round's day. */
export function doneAt(iso: string, timeZone: string, roundDate: string): string {
  const day = dateFormat(timeZone, {}, 'en-CA').format(new Date(iso))
  const time = clockTime(iso, timeZone)
  return day === roundDate ? time : `${time} on ${longDate(day)}`
}
