import { dateFormat } from '../../../lib/zone-format'

/** An instant as facility wall time: "Wed 3 Dec 2026, 09:00". */
export const formatInstant = (iso: string, zone: string) =>
  dateFormat(zone, { weekday: 'short', day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit', hourCycle: 'h23' }).format(
    new Date(iso),
  )

/** A facility date ("2026-11-01") as "1 Nov 2026", formatted as UTC so the browser's zone never shifts it. */
export const formatDate = (isoDate: string) => dateFormat('UTC', { day: 'numeric', month: 'short', year: 'numeric' }).format(new Date(`${isoDate}T00:00:00Z`))
