import { DateTime } from 'luxon'
import type { IANAZone } from 'luxon'
import { RRule, parseRule } from './parse-rule'
import type { RuleUntil } from './parse-rule'
import {
  DAY_MS,
  floatingMsToInstant,
  floatingMsToWall,
  formatUtcInstant,
  formatWallTime,
  instantToFloatingMs,
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
}

export type Occurrence = {
  /** Wall time in the rule's zone, `YYYY-MM-DDTHH:mm:ss`. */
  local: string
  /** The same moment in UTC, `YYYY-MM-DDTHH:mm:ssZ`. */
  utc: string
}

const DEFAULT_LIMIT = 1000
// rrule stops iterating after year 9999, so this works as an open end
const END_OF_TIME = Date.UTC(9999, 11, 31, 23, 59, 59)

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
  const zone = resolveZone(input.tzid)
  const dtstartMs = wallToFloatingMs(parseWallTime(input.dtstart, 'dtstart'))
  const limit = input.limit ?? DEFAULT_LIMIT
  if (!Number.isInteger(limit) || limit < 0) throw new Error(`Invalid limit ${limit}: expected a whole number of 0 or more`)
  const rule = parseRule(input.rrule)
  const lower = parseInstant(input.from, 'from', zone)
  const upper = earliest(parseInstant(input.to, 'to', zone), untilToInstant(rule.until, zone))
  if (limit === 0 || (lower !== undefined && upper !== undefined && lower > upper)) return []

  const recurrence = new RRule({ ...rule.options, dtstart: new Date(dtstartMs), until: null, tzid: null }, true)
  const windowStart = lower === undefined ? dtstartMs : Math.max(dtstartMs, instantToFloatingMs(lower, zone) - DAY_MS)
  let windowEnd = upper === undefined ? END_OF_TIME : instantToFloatingMs(upper, zone) + DAY_MS
  const instants = new Set<number>()

  recurrence.between(new Date(windowStart), new Date(windowEnd), true, (floating) => {
    const floatingMs = floating.getTime()
    if (floatingMs > windowEnd) return false
    const instant = floatingMsToInstant(floatingMs, zone)
    if ((lower === undefined || instant >= lower) && (upper === undefined || instant <= upper)) {
      // Set: wall times moved forward out of a DST gap can land on an instant already present
      // (RFC 5545 §3.8.5.3: duplicate instances are ignored)
      instants.add(instant)
      // a later wall time can map to an earlier instant only across a gap, which is under a day
      if (instants.size === limit) windowEnd = Math.min(windowEnd, floatingMs + DAY_MS)
    }
    return true
  })

  return [...instants]
    .sort((a, b) => a - b)
    .slice(0, limit)
    .map((instant) => ({
      local: formatWallTime(floatingMsToWall(instantToFloatingMs(instant, zone))),
      utc: formatUtcInstant(instant),
    }))
}
