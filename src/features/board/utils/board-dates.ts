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

const format = (iso: string, options: Intl.DateTimeFormatOptions) => new Intl.DateTimeFormat('en-GB', { ...options, timeZone: 'UTC' }).format(asDate(iso))

/** "Tuesday 8 December" */
export const longDay = (iso: string) => format(iso, { weekday: 'long', day: 'numeric', month: 'long' })
/** "Tuesday 8 December 2026" */
export const fullDay = (iso: string) => format(iso, { weekday: 'long', day: 'numeric', month: 'long', year: 'numeric' })
export const shortWeekday = (iso: string) => format(iso, { weekday: 'short' })
export const dayOfMonth = (iso: string) => String(asDate(iso).getUTCDate())
