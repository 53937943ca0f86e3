import { DateTime } from 'luxon'

/** Today's calendar date in the facility's zone, whatever zone the browser is in. */
export const todayIn = (timeZone: string) => DateTime.now().setZone(timeZone).toISODate() ?? DateTime.now().toISODate()!

export const addDays = (isoDate: string, days: number) => DateTime.fromISO(isoDate, { zone: 'UTC' }).plus({ days }).toISODate()!

// Wall times are formatted as if in UTC so the browser's own zone never shifts them.
const weekdayFormat = new Intl.DateTimeFormat('en-GB', { weekday: 'short', timeZone: 'UTC' })
const longWeekdayFormat = new Intl.DateTimeFormat('en-GB', { weekday: 'long', timeZone: 'UTC' })
const dateFormat = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric', timeZone: 'UTC' })
const asUtc = (localDate: string) => new Date(`${localDate.slice(0, 10)}T00:00:00Z`)

export const weekdayOf = (localDate: string) => weekdayFormat.format(asUtc(localDate))
export const longWeekdayOf = (localDate: string) => longWeekdayFormat.format(asUtc(localDate))
export const formatLocalDate = (localDate: string) => dateFormat.format(asUtc(localDate))
