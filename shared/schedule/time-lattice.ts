import type { WallTime } from './zone-time'

const gcd = (a: number, b: number): number => (b === 0 ? a : gcd(b, a % b))
const mod = (a: number, n: number) => ((a % n) + n) % n

const DAY_FILTERS = ['BYMONTH', 'BYWEEKNO', 'BYYEARDAY', 'BYMONTHDAY', 'BYDAY']

/**
 * Why an HOURLY, MINUTELY or SECONDLY rule can never reach the times its BYHOUR, BYMINUTE or
 * BYSECOND ask for, or null when it can. rrule 2.8.1 steps such a rule from period to period in
 * a loop of its own until the time matches, with no end and no way for a step budget to stop it:
 * FREQ=MINUTELY;INTERVAL=10;BYMINUTE=17 from 07:30 steps :40, :50, :00 … for ever. Stepping by
 * INTERVAL reaches only the hours (minutes, seconds) of DTSTART's plus a multiple of
 * gcd(INTERVAL, 24) (gcd(INTERVAL, 60)), as python-dateutil also checks.
 * rrule carries minutes into BYHOUR (seconds into BYMINUTE) by skipping whole hours (minutes) in
 * steps of the carry; after a day filtered out by a day part, or with INTERVAL above 60, that
 * carry can be 24 hours or 40 minutes and loop for ever too, so those combinations are refused.
 */
export function unreachableTimeProblem(
  freq: string | undefined,
  parts: ReadonlyMap<string, string>,
  start: Pick<WallTime, 'hour' | 'minute' | 'second'>,
): string | null {
  if (!['HOURLY', 'MINUTELY', 'SECONDLY'].includes(freq ?? '')) return null
  const interval = Number(parts.get('INTERVAL') ?? 1)
  const numbers = (name: string) => parts.get(name)?.split(',').map(Number)
  const [byhour, byminute, bysecond] = [numbers('BYHOUR'), numbers('BYMINUTE'), numbers('BYSECOND')]
  const carriedInto = freq === 'MINUTELY' ? byhour && 'BYHOUR' : freq === 'SECONDLY' ? (byhour || byminute) && 'BYHOUR or BYMINUTE' : undefined
  if (carriedInto && (interval > 60 || DAY_FILTERS.some((p) => parts.has(p)))) {
    return `Roundtide cannot plan FREQ=${freq} with ${carriedInto} together with INTERVAL above 60 or a day part (${DAY_FILTERS.join(', ')}). Use FREQ=DAILY with BYHOUR and BYMINUTE for times within the day.`
  }
  const never = (unit: string, part: string) =>
    `This rule never reaches its ${part}: every ${interval} ${unit}s from ${String(start.hour).padStart(2, '0')}:${String(start.minute).padStart(2, '0')} never lands on ${part.replace('BY', '').toLowerCase()} ${parts.get(part)}. Change INTERVAL, ${part} or the start time.`
  if (freq === 'HOURLY') return byhour && !byhour.some((h) => mod(h - start.hour, gcd(interval, 24)) === 0) ? never('hour', 'BYHOUR') : null
  if (freq === 'MINUTELY') return byminute && !byminute.some((m) => mod(m - start.minute, gcd(interval, 60)) === 0) ? never('minute', 'BYMINUTE') : null
  return bysecond && !bysecond.some((s) => mod(s - start.second, gcd(interval, 60)) === 0) ? never('second', 'BYSECOND') : null
}
