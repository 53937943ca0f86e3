import { clockTime, dateFormat } from '../../../lib/zone-format'
import { DateTime } from 'luxon'

/** "Wednesday 2 December 2026" for a facility date (YYYY-MM-DD). */
export const longDate = (isoDate: string) =>
  dateFormat('UTC', { weekday: 'long', day: 'numeric', month: 'long', year: 'numeric' }).format(new Date(`${isoDate}T00:00:00Z`))

/** "08:10" in the facility's zone. */
export { clockTime }

/** A time written on the sheet for the sheet's day, as an instant; null when it is not a time. */
export function paperTime(date: string, hhmm: string, timeZone: string): string | null {
  if (!/^([01]\d|2[0-3]):[0-5]\d$/.test(hhmm)) return null
  const at = DateTime.fromISO(`${date}T${hhmm}`, { zone: timeZone })
  return at.isValid ? at.toUTC().toISO() : null
}

export const todayIn = (timeZone: string) => DateTime.now().setZone(timeZone).toISODate()!
