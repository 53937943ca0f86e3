import { dateFormat as formatter, formatWhen } from '../../../lib/zone-format'

export { formatWhen }

/** An axis tick: "13 Jul" in the facility's zone. */
export const formatTick = (at: number, timeZone: string) => formatter(timeZone, { day: 'numeric', month: 'short' }).format(new Date(at))

/** A facility calendar date (YYYY-MM-DD) or local date-time, shown without any zone shift. */
export const formatLocalDay = (local: string) =>
  formatter('UTC', { weekday: 'short', day: 'numeric', month: 'short', year: 'numeric' }).format(new Date(`${local.slice(0, 10)}T00:00:00Z`))

const threePlaces = new Intl.NumberFormat('en', { maximumFractionDigits: 3 })
export const formatValue = (value: number) => threePlaces.format(value)

export const withUnit = (value: number, unit: string) => (unit ? `${formatValue(value)} ${unit}` : formatValue(value))
