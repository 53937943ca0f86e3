const cache = new Map<string, Intl.DateTimeFormat>()

function format(timeZone: string, kind: 'when' | 'day') {
  const key = `${timeZone}|${kind}`
  let f = cache.get(key)
  if (!f) {
    const options: Intl.DateTimeFormatOptions =
      kind === 'day'
        ? { weekday: 'short', day: 'numeric', month: 'short' }
        : { weekday: 'short', day: 'numeric', month: 'short', hour: '2-digit', minute: '2-digit', hourCycle: 'h23' }
    f = new Intl.DateTimeFormat('en-GB', { ...options, timeZone })
    cache.set(key, f)
  }
  return f
}

/** An instant as facility wall time, e.g. "Mon 13 Jul, 08:00". */
export const formatWhen = (iso: string, timeZone: string) => format(timeZone, 'when').format(new Date(iso))

/** A facility calendar date (YYYY-MM-DD), shown without any zone shift. */
export const formatDay = (localDate: string) => format('UTC', 'day').format(new Date(`${localDate}T00:00:00Z`))
