const cache = new Map<string, Intl.DateTimeFormat>()

function formatter(timeZone: string, options: Intl.DateTimeFormatOptions) {
  const key = `${timeZone}|${JSON.stringify(options)}`
  let f = cache.get(key)
  if (!f) cache.set(key, (f = new Intl.DateTimeFormat('en-GB', { ...options, timeZone })))
  return f
}

/** An instant as facility wall time, e.g. "Mon 13 Jul, 08:00". */
export const formatWhen = (at: string | number, timeZone: string) =>
  formatter(timeZone, { weekday: 'short', day: 'numeric', month: 'short', hour: '2-digit', minute: '2-digit', hourCycle: 'h23' }).format(new Date(at))

/** An axis tick: "13 Jul" in the facility's zone. */
export const formatTick = (at: number, timeZone: string) => formatter(timeZone, { day: 'numeric', month: 'short' }).format(new Date(at))

/** A facility calendar date (YYYY-MM-DD) or local date-time, shown without any zone shift. */
export const formatLocalDay = (local: string) =>
  formatter('UTC', { weekday: 'short', day: 'numeric', month: 'short', year: 'numeric' }).format(new Date(`${local.slice(0, 10)}T00:00:00Z`))

export const formatValue = (value: number) => new Intl.NumberFormat('en', { maximumFractionDigits: 3 }).format(value)

export const withUnit = (value: number, unit: string) => (unit ? `${formatValue(value)} ${unit}` : formatValue(value))
