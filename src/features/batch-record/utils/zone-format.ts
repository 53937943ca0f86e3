/** An instant as facility wall time: "Wed 3 Dec 2026, 09:00". */
export const formatInstant = (iso: string, zone: string) =>
  new Intl.DateTimeFormat('en-GB', {
    weekday: 'short',
    day: 'numeric',
    month: 'short',
    year: 'numeric',
    hour: '2-digit',
    minute: '2-digit',
    hourCycle: 'h23',
    timeZone: zone,
  }).format(new Date(iso))

/** A facility date ("2026-11-01") as "1 Nov 2026", formatted as UTC so the browser's zone never shifts it. */
export const formatDate = (isoDate: string) =>
  new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric', timeZone: 'UTC' }).format(new Date(`${isoDate}T00:00:00Z`))
