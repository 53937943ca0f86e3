import { DateTime } from 'luxon'
import { dateFormat, formatWhen } from '../../../lib/zone-format'

/** Today's date on the facility's clock, whatever zone the browser is in. */
export const todayIn = (zone: string) => DateTime.now().setZone(zone).toISODate()!

export const addDays = (isoDate: string, days: number) => DateTime.fromISO(isoDate, { zone: 'UTC' }).plus({ days }).toISODate()!

/** An instant (ISO with offset) as facility wall time: "Wed 3 Dec, 09:00". */
export const formatInstant = (iso: string, zone: string) => formatWhen(iso, zone)

/** A facility wall time ("2026-12-03T09:00[:00]") as "Wed 3 Dec, 09:00"; formatted as UTC so the browser's zone never shifts it. */
export const formatWallTime = (local: string) => formatWhen(`${local.slice(0, 16)}:00Z`, 'UTC')

/** A facility date as "Wednesday 3 December 2026". */
export const formatLongDate = (isoDate: string) =>
  dateFormat('UTC', { weekday: 'long', day: 'numeric', month: 'long', year: 'numeric' }).format(new Date(`${isoDate.slice(0, 10)}T00:00:00Z`))
