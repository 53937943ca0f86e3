import { DateTime } from 'luxon'
import type { DateRange } from './report-paths'

const ISO_DATE = /^\d{4}-\d{2}-\d{2}$/
export const MAX_RANGE_DAYS = 366

/** The range in the address, or the last seven facility days up to today. */
export function rangeFrom(search: URLSearchParams, timeZone: string): DateRange {
  const today = DateTime.now().setZone(timeZone)
  const from = search.get('from') ?? ''
  const to = search.get('to') ?? ''
  return {
    from: ISO_DATE.test(from) ? from : today.minus({ days: 6 }).toISODate()!,
    to: ISO_DATE.test(to) ? to : today.toISODate()!,
  }
}

/** Why the server would refuse this range, or null when it is fine. */
export function rangeProblem({ from, to }: DateRange): string | null {
  if (to < from) return 'The range ends before it starts.'
  const days = DateTime.fromISO(to).diff(DateTime.fromISO(from), 'days').days
  return days > MAX_RANGE_DAYS ? 'Ask for at most a year at a time.' : null
}

const dayFormat = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric', timeZone: 'UTC' })
export const formatDate = (isoDate: string) => dayFormat.format(new Date(`${isoDate}T00:00:00Z`))
export const describeRange = (r: DateRange) => (r.from === r.to ? formatDate(r.from) : `${formatDate(r.from)} – ${formatDate(r.to)}`)
