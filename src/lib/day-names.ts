// Facility calendar days ("YYYY-MM-DD") handled as UTC midnights, so the browser's own zone never shifts a day.
const asDate = (iso: string) => new Date(`${iso.slice(0, 10)}T00:00:00Z`)

// Names by hand rather than Intl.DateTimeFormat: the board is in English, and building a
// formatter costs tens of milliseconds of a phone's first render for a dozen labels.
const WEEKDAYS = ['Sunday', 'Monday', 'Tuesday', 'Wednesday', 'Thursday', 'Friday', 'Saturday']
const MONTHS = ['January', 'February', 'March', 'April', 'May', 'June', 'July', 'August', 'September', 'October', 'November', 'December']
const weekday = (iso: string) => WEEKDAYS[asDate(iso).getUTCDay()]

/** "Tuesday 8 December" (the Round's header, the board's day) */
export const longDay = (iso: string) => `${weekday(iso)} ${dayOfMonth(iso)} ${MONTHS[asDate(iso).getUTCMonth()]}`
/** "Tuesday, 8 December 2026" */
export const fullDay = (iso: string) => `${weekday(iso)}, ${dayOfMonth(iso)} ${MONTHS[asDate(iso).getUTCMonth()]} ${asDate(iso).getUTCFullYear()}`
/** "Tue" */
export const shortWeekday = (iso: string) => weekday(iso).slice(0, 3)
export function dayOfMonth(iso: string) {
  return String(asDate(iso).getUTCDate())
}
