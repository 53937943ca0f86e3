import { DateTime } from 'luxon'

const utc = (iso: string) => DateTime.fromISO(iso, { zone: 'UTC' })

export const todayIn = (timeZone: string) => DateTime.now().setZone(timeZone).toISODate()!
export const addDays = (iso: string, days: number) => utc(iso).plus({ days }).toISODate()!
export const mondayOf = (iso: string) => utc(iso).startOf('week').toISODate()!
export const isMonday = (iso: string) => utc(iso).isValid && utc(iso).weekday === 1
export const datesFrom = (start: string, count: number) => Array.from({ length: count }, (_, i) => addDays(start, i))

/** "Mon" and "13 Jul" for a grid header; facility dates carry no zone, so none is applied. */
export const weekdayShort = (iso: string) => utc(iso).toFormat('ccc')
export const dayMonth = (iso: string) => utc(iso).toFormat('d LLL')
export const longDay = (iso: string) => utc(iso).toFormat('ccc d LLL yyyy')
