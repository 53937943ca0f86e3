/** "10:42" in the facility's time zone, whatever the phone's own zone is. */
export function clockTime(iso: string, timeZone: string): string {
  return new Intl.DateTimeFormat('en-GB', { hour: '2-digit', minute: '2-digit', hourCycle: 'h23', timeZone }).format(new Date(iso))
}

/** "Wednesday 2 December" for a facility date (YYYY-MM-DD). */
export function longDate(isoDate: string): string {
  const [y, m, d] = isoDate.split('-').map(Number)
  return new Intl.DateTimeFormat('en-GB', { weekday: 'long', day: 'numeric', month: 'long', timeZone: 'UTC' }).format(new Date(Date.UTC(y, m - 1, d)))
}

/** A time for "done at", with the date only when it is not the round's day. */
export function doneAt(iso: string, timeZone: string, roundDate: string): string {
  const day = new Intl.DateTimeFormat('en-CA', { timeZone }).format(new Date(iso))
  const time = clockTime(iso, timeZone)
  return day === roundDate ? time : `${time} on ${longDate(day)}`
}
