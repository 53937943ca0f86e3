/** FullCalendar hands out local midnights; the API speaks facility calendar days. */
export function isoDay(date: Date): string {
  const pad = (n: number) => String(n).padStart(2, '0')
  return `${date.getFullYear()}-${pad(date.getMonth() + 1)}-${pad(date.getDate())}`
}

/** The visible range as inclusive days; FullCalendar's end is exclusive. */
export function visibleRange(start: Date, end: Date) {
  const last = new Date(end)
  last.setDate(last.getDate() - 1)
  return { from: isoDay(start), to: isoDay(last) }
}

export const CALENDAR_VIEWS = { month: 'dayGridMonth', week: 'dayGridWeek' } as const
export type CalendarViewName = keyof typeof CALENDAR_VIEWS
export const viewNameOf = (type: string): CalendarViewName => (type === CALENDAR_VIEWS.week ? 'week' : 'month')

const longFormat = new Intl.DateTimeFormat('en-GB', { weekday: 'long', day: 'numeric', month: 'long', timeZone: 'UTC' })
/** "Tuesday 8 December" for an ISO day. */
export const longDay = (iso: string) => longFormat.format(new Date(`${iso}T00:00:00Z`))
