// Board dates are facility-local calendar days ("YYYY-MM-DD"); they are handled as UTC midnights
// so the browser's own zone never shifts a day.
const asDate = (iso: string) => new Date(`${iso}T00:00:00Z`)
const toIso = (d: Date) => d.toISOString().slice(0, 10)

export const ISO_DATE = /^\d{4}-\d{2}-\d{2}$/

export function addDays(iso: string, days: number): string {
  const d = asDate(iso)
  d.setUTCDate(d.getUTCDate() + days)
  return toIso(d)
}

/** Monday to Sunday of the week holding this day. */
export function weekOf(iso: string): string[] {
  const monday = addDays(iso, -((asDate(iso).getUTCDay() + 6) % 7))
  return Array.from({ length: 7 }, (_, i) => addDays(monday, i))
}

// Names by hand rather than Intl.DateTimeFormat: the board is in English, and building a
// formatter costs tens of milliseconds of a phone's first render for a dozen labels.
const WEEKDAYS = ['Sunday', 'Monday', 'Tuesday', 'Wednesday', 'Thursday', 'Friday', 'Saturday']
const MONTHS = ['January', 'February', 'March', 'April', 'May', 'June', 'July', 'August', 'September', 'October', 'November', 'December']
const weekday = (iso: string) => WEEKDAYS[asDate(iso).getUTCDay()]

/** "Tuesday 8 December" */
export const longDay = (iso: string) => `${weekday(iso)} ${dayOfMonth(iso)} ${MONTHS[asDate(iso).getUTCMonth()]}`
/** "Tuesday, 8 December 2026" */
export const fullDay = (iso: string) => `${weekday(iso)}, ${dayOfMonth(iso)} ${MONTHS[asDate(iso).getUTCMonth()]} ${asDate(iso).getUTCFullYear()}`
/** "Tue" */
export const shortWeekday = (iso: string) => weekday(iso).slice(0, 3)
export function dayOfMonth(iso: string) {
  return String(asDate(iso).getUTCDate())
}
