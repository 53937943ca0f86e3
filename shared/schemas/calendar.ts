import { text } from './text'

const DATE = /^(\d{4})-(\d{2})-(\d{2})$/
const DATE_TIME = /^(\d{4})-(\d{2})-(\d{2})T(\d{2}):(\d{2})(?::(\d{2}))?$/

/** True when year-month-day names a day that exists in the Gregorian calendar (2026-02-30 does not). */
export function isRealDate(year: number, month: number, day: number): boolean {
  if (year < 1900 || month < 1 || month > 12 || day < 1) return false
  const daysInMonth = new Date(Date.UTC(year, month, 0)).getUTCDate()
  return day <= daysInMonth
}

function realDateTime(text: string): boolean {
  const m = DATE_TIME.exec(text)
  if (!m) return true // the shape error already speaks for it
  const [year, month, day, hour, minute, second] = m.slice(1).map((part) => Number(part ?? 0))
  return isRealDate(year, month, day) && hour <= 23 && minute <= 59 && second <= 59
}

const CALENDAR_DATE = text()
  .regex(DATE, 'Use YYYY-MM-DD')
  // zod runs refinements after a failed regex too; the shape error already speaks for that case.
  .refine((text) => {
    const parts = DATE.exec(text)?.map(Number)
    return !parts || isRealDate(parts[1], parts[2], parts[3])
  }, 'There is no such date')

/**
 * The one schema for a calendar date, `YYYY-MM-DD`: the shape, and a day that exists.
 * Every date field in the shared schemas uses it, so an impossible date is a 400 at the door.
 * One instance, as with `text()`.
 */
export const calendarDate = () => CALENDAR_DATE

/** A wall-clock date and time without a zone, `YYYY-MM-DDTHH:mm[:ss]`, on a real day and a real time. */
export const wallDateTime = ({ seconds }: { seconds: 'required' | 'optional' }) =>
  text()
    .regex(
      seconds === 'required' ? /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}$/ : /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}(:\d{2})?$/,
      seconds === 'required' ? 'Use YYYY-MM-DDTHH:mm:ss' : 'Use YYYY-MM-DDTHH:mm',
    )
    .refine(realDateTime, 'There is no such date or time')
