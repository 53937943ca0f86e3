import { DateTime } from 'luxon'

/** Facility midnights across the range, about six of them, so the axis reads in whole days. */
export function dayTicks(from: number, to: number, timeZone: string): number[] {
  const days = (to - from) / 86_400_000
  const step = days <= 8 ? 1 : days <= 31 ? 5 : 15
  const ticks: number[] = []
  let at = DateTime.fromMillis(from, { zone: timeZone }).startOf('day').plus({ days: 1 })
  while (at.toMillis() <= to) {
    ticks.push(at.toMillis())
    at = at.plus({ days: step })
  }
  return ticks
}
