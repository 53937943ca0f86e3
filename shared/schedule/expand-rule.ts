import { DateTime } from 'luxon'
import type { IANAZone } from 'luxon'
import { RRule, parseRule } from './parse-rule'
import type { ParsedRule, RuleUntil } from './parse-rule'
import { unreachableTimeProblem } from './time-lattice'
import { RULE_LIMITS, limitPeriods, stepsPerPeriod } from './rule-limits'
import {
  DAY_MS,
  floatingMsToInstant,
  floatingMsToWall,
  formatUtcInstant,
  formatWallTime,
  instantToFloatingMs,
  offsetSpreadMs,
  parseWallTime,
  resolveZone,
  wallToFloatingMs,
} from './zone-time'

export type ExpandRuleInput = {
  /** RRULE value, with or without the `RRULE:` prefix. */
  rrule: string
  /** Local wall time of the first occurrence, `YYYY-MM-DDTHH:mm:ss`, in `tzid`. */
  dtstart: string
  /** IANA time zone, e.g. `Europe/Berlin`. */
  tzid: string
  /** Earliest instant to return (inclusive). ISO; without an offset it is read in `tzid`. */
  from?: string
  /** Latest instant to return (inclusive). ISO; without an offset it is read in `tzid`. */
  to?: string
  /** Most occurrences to return; default 1000. */
  limit?: number
  /** Most work to do, in days of candidates; default RULE_LIMITS.maxSteps. */
  maxSteps?: number
}

/** The work a walk did: rrule's periods in steps (RULE_LIMITS.maxSteps) and the dates it placed in the zone. */
export type RuleWork = { steps: number; placed: number }

export type BoundedInstants = {
  /** The occurrences as instants (UTC milliseconds), in order. */
  instants: number[]
  /** False when the walk stopped at its period budget before the end of the window. */
  complete: boolean
  /** The end of the window that was searched, as a floating (wall-time-as-UTC) millisecond count. */
  searchedUntilFloatingMs: number
  work: RuleWork
}

export type BoundedExpansion = Omit<BoundedInstants, 'instants'> & { occurrences: Occurrence[] }

export type Occurrence = {
  /** Wall time in the rule's zone, `YYYY-MM-DDTHH:mm:ss`. */
  local: string
  /** The same moment in UTC, `YYYY-MM-DDTHH:mm:ssZ`. */
  utc: string
}

const DEFAULT_LIMIT = 1000
const YEAR_MS = 365.25 * DAY_MS
// Fixed-length periods, and months for MONTHLY (12 for YEARLY): the walk can start shortly before
// the window instead of at DTSTART years back, so the work follows the window (see startNearWindow).
const PERIOD_MS: Record<string, number> = { WEEKLY: 7 * DAY_MS, DAILY: DAY_MS, HOURLY: 3_600_000, MINUTELY: 60_000, SECONDLY: 1000 }
const PERIOD_MONTHS: Record<string, number> = { MONTHLY: 1, YEARLY: 12 }
const DAY_PARTS = ['BYWEEKNO', 'BYYEARDAY', 'BYMONTHDAY', 'BYDAY']

function parseInstant(text: string | undefined, label: string, zone: IANAZone): number | undefined {
  if (text === undefined) return undefined
  const parsed = DateTime.fromISO(text, { zone })
  if (!parsed.isValid) throw new Error(`Invalid ${label} "${text}": expected an ISO date-time such as 2025-03-30T00:00:00Z`)
  return parsed.toMillis()
}

function untilToInstant(until: RuleUntil | null, zone: IANAZone): number | undefined {
  if (until === null) return undefined
  // RFC 5545 wants UNTIL to match DTSTART's type; a bare date is taken to include that whole local day
  const wall = until.isDateOnly ? { ...until, hour: 23, minute: 59, second: 59 } : until
  const floatingMs = wallToFloatingMs(wall)
  return until.isUtc ? floatingMs : floatingMsToInstant(floatingMs, zone)
}

function earliest(...instants: (number | undefined)[]): number | undefined {
  const known = instants.filter((instant) => instant !== undefined)
  return known.length > 0 ? Math.min(...known) : undefined
}

/**
 * Expands an RRULE into dated occurrences in an IANA zone, independent of the process TZ.
 *
 * The rule is walked by rrule in floating time (wall times stored as UTC fields, no tzid), because
 * rrule's own tzid support depends on the process TZ. Each wall time is then placed in the zone,
 * so a daily 07:30 stays 07:30 local across DST changes. Bounds (UNTIL, from, to) are compared
 * as real instants; the floating window is widened by a day on each side and filtered exactly.
 */
export function expandRule(input: ExpandRuleInput): Occurrence[] {
  return expandRuleBounded(input).occurrences
}

type WalkStart = { dtstartMs: number; defaults: Partial<ParsedRule['options']> }

/**
 * Where rrule may start walking: DTSTART moved forward by whole periods (times INTERVAL) to one
 * step before the window. That gives the same dates, because a period's dates depend only on
 * the period and the BY parts; the time of day is kept, and the day rrule would take from DTSTART
 * (RFC 5545: a MONTHLY rule without day parts repeats DTSTART's day) is written out first.
 * COUNT counts from the real DTSTART, so such rules are walked from there.
 */
function startNearWindow(rule: ParsedRule, dtstartMs: number, windowStartMs: number): WalkStart {
  const freq = rule.parts.get('FREQ') ?? ''
  const interval = Number(rule.parts.get('INTERVAL') ?? 1)
  const unchanged = { dtstartMs, defaults: {} }
  if (rule.parts.has('COUNT') || windowStartMs <= dtstartMs) return unchanged
  const period = PERIOD_MS[freq]
  if (period) {
    const steps = Math.floor((windowStartMs - dtstartMs) / (period * interval)) - 1
    return steps > 0 ? { dtstartMs: dtstartMs + steps * period * interval, defaults: {} } : unchanged
  }
  const months = PERIOD_MONTHS[freq] * interval
  const start = new Date(dtstartMs)
  const window = new Date(windowStartMs)
  const monthsApart = (window.getUTCFullYear() - start.getUTCFullYear()) * 12 + window.getUTCMonth() - start.getUTCMonth()
  const steps = Math.floor(monthsApart / months) - 1
  if (steps <= 0) return unchanged
  const hasDayPart = DAY_PARTS.some((part) => rule.parts.has(part))
  const defaults = hasDayPart
    ? {}
    : freq === 'YEARLY'
      ? { bymonth: rule.options.bymonth ?? [start.getUTCMonth() + 1], bymonthday: [start.getUTCDate()] }
      : { bymonthday: [start.getUTCDate()] }
  const firstOfMonth = Date.UTC(
    start.getUTCFullYear(),
    start.getUTCMonth() + steps * months,
    1,
    start.getUTCHours(),
    start.getUTCMinutes(),
    start.getUTCSeconds(),
  )
  // Day 1 of the month: DTSTART's own day may not exist there (31st, 29 February).
  return { dtstartMs: firstOfMonth, defaults }
}

/** expandRule with what the bounds cut off: a walk is never longer than its period budget or the search span. */
export function expandRuleBounded(input: ExpandRuleInput): BoundedExpansion {
  const { instants, ...walk } = expandRuleInstants(input)
  const zone = resolveZone(input.tzid)
  const occurrences = instants.map((instant) => ({
    local: formatWallTime(floatingMsToWall(instantToFloatingMs(instant, zone))),
    utc: formatUtcInstant(instant),
  }))
  return { ...walk, occurrences }
}

/** expandRuleBounded without writing the dates out, for checks that only count them. */
export function expandRuleInstants(input: ExpandRuleInput): BoundedInstants {
  const zone = resolveZone(input.tzid)
  const dtstartWall = parseWallTime(input.dtstart, 'dtstart')
  const dtstartMs = wallToFloatingMs(dtstartWall)
  const limit = input.limit ?? DEFAULT_LIMIT
  if (!Number.isInteger(limit) || limit < 0) throw new Error(`Invalid limit ${limit}: expected a whole number of 0 or more`)
  const rule = parseRule(input.rrule)
  // Before rrule sees it: such a rule would hold the event loop for ever (see time-lattice.ts).
  const unreachable = unreachableTimeProblem(rule.parts.get('FREQ'), rule.parts, dtstartWall)
  if (unreachable) throw new Error(unreachable)
  const lower = parseInstant(input.from, 'from', zone)
  const upper = earliest(parseInstant(input.to, 'to', zone), untilToInstant(rule.until, zone))
  const windowStart = lower === undefined ? dtstartMs : Math.max(dtstartMs, instantToFloatingMs(lower, zone) - DAY_MS)
  const spanEnd = windowStart + RULE_LIMITS.searchYears * YEAR_MS
  let windowEnd = upper === undefined ? spanEnd : Math.min(spanEnd, instantToFloatingMs(upper, zone) + DAY_MS)
  const searchedUntilFloatingMs = windowEnd
  if (limit === 0 || (lower !== undefined && upper !== undefined && lower > upper)) {
    return { instants: [], complete: true, searchedUntilFloatingMs, work: { steps: 0, placed: 0 } }
  }

  const walk = startNearWindow(rule, dtstartMs, windowStart)
  const recurrence = new RRule({ ...rule.options, ...walk.defaults, dtstart: new Date(walk.dtstartMs), until: null, tzid: null }, true)
  const budget = limitPeriods(recurrence, input.maxSteps ?? RULE_LIMITS.maxSteps, stepsPerPeriod(rule.parts))
  const instants = new Set<number>()
  let placed = 0

  recurrence.between(new Date(windowStart), new Date(windowEnd), true, (floating) => {
    const floatingMs = floating.getTime()
    if (floatingMs > windowEnd) return false
    const instant = floatingMsToInstant(floatingMs, zone)
    placed++
    if ((lower === undefined || instant >= lower) && (upper === undefined || instant <= upper)) {
      // Set: wall times moved forward out of a DST gap can land on an instant already present
      // (RFC 5545 §3.8.5.3: duplicate instances are ignored)
      instants.add(instant)
      // A later wall time can map to an earlier instant only across a gap, by less than the gap:
      // look that much further where the offset changes nearby, and stop at once where it does
      // not (a dense rule would otherwise walk on; a whole extra day of FREQ=HOURLY with 3,600
      // times an hour placed 86,400 dates).
      if (instants.size === limit) windowEnd = Math.min(windowEnd, floatingMs + offsetSpreadMs(zone, floatingMs))
    }
    return true
  })

  return {
    instants: [...instants].sort((a, b) => a - b).slice(0, limit),
    complete: !budget.exhausted || instants.size >= limit,
    searchedUntilFloatingMs,
    work: { steps: budget.steps, placed },
  }
}
