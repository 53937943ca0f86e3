const MIN = 60_000
const HOUR = 60 * MIN
const DAY = 24 * HOUR

/** A span as a person reads it: "2 d 4 h", "5 h 12 min", "12 min 30 s" (seconds only in the last hour). */
export function spanText(ms: number): string {
  const a = Math.abs(ms)
  if (a >= DAY) return `${Math.floor(a / DAY)} d ${Math.floor((a % DAY) / HOUR)} h`
  if (a >= HOUR) return `${Math.floor(a / HOUR)} h ${Math.floor((a % HOUR) / MIN)} min`
  return `${Math.floor(a / MIN)} min ${Math.floor((a % MIN) / 1000)} s`
}
