// Building an Intl.DateTimeFormat costs far more than using one (on a slowed phone the Round's
// dates alone took 200 ms of its first second), so every screen shares formatters built once.
const cache = new Map<string, Intl.DateTimeFormat>()

/** An en-GB formatter for these options in this zone, built on first use and kept. */
export function dateFormat(timeZone: string, options: Intl.DateTimeFormatOptions, locale = 'en-GB'): Intl.DateTimeFormat {
  const key = `${locale}|${timeZone}|${JSON.stringify(options)}`
  let f = cache.get(key)
  if (!f) cache.set(key, (f = new Intl.DateTimeFormat(locale, { ...options, timeZone })))
  return f
}

const WHEN: Intl.DateTimeFormatOptions = { weekday: 'short', day: 'numeric', month: 'short', hour: '2-digit', minute: '2-digit', hourCycle: 'h23' }

/** An instant as facility wall time, e.g. "Mon 13 Jul, 08:00". */
export const formatWhen = (iso: string | number, timeZone: string) => dateFormat(timeZone, WHEN).format(new Date(iso))

/** A facility calendar date (YYYY-MM-DD), shown without any zone shift. */
export const formatDay = (localDate: string) =>
  dateFormat('UTC', { weekday: 'short', day: 'numeric', month: 'short' }).format(new Date(`${localDate}T00:00:00Z`))

/** "10:42" in the facility's time zone, whatever the phone's own zone is. */
export const clockTime = (iso: string, timeZone: string) => dateFormat(timeZone, { hour: '2-digit', minute: '2-digit', hourCycle: 'h23' }).format(new Date(iso))
