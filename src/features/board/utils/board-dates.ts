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

export { dayOfMonth, fullDay, longDay, shortWeekday } from '../../../lib/day-names'
