import { validateRule } from './describe-rule'
import { expandRuleBounded } from './expand-rule'
import { parseRule } from './parse-rule'
import { RULE_LIMITS, stepsPerPeriod } from './rule-limits'
import { DAY_MS } from './zone-time'

const PERIOD_DAYS: Record<string, number> = { YEARLY: 365.25, MONTHLY: 30.44, WEEKLY: 7, DAILY: 1, HOURLY: 1 / 24, MINUTELY: 1 / 1440, SECONDLY: 1 / 86_400 }

/** How far after its start a rule is searched for a first date, in words ("13 years", "208 days"). */
function searchReach(rrule: string): string {
  const rule = parseRule(rrule)
  const freq = rule.parts.get('FREQ') ?? 'DAILY'
  const periods = RULE_LIMITS.maxSteps / stepsPerPeriod(freq)
  const days = Math.min(RULE_LIMITS.searchYears * 365.25, periods * PERIOD_DAYS[freq] * Number(rule.parts.get('INTERVAL') ?? 1))
  if (days >= 730) return `${Math.floor(days / 365.25)} years`
  if (days >= 2) return `${Math.floor(days)} days`
  return `${Math.max(1, Math.floor(days * 24))} hours`
}

/**
 * Why Roundtide cannot plan tasks from this rule, or null when it can: the rule must be valid,
 * give a first date within a bounded search after its start, and give at most one task every
 * 15 minutes on average over the planning horizon. Every expansion behind it is bounded, so the
 * answer comes in tens of milliseconds whatever the rule. Used by the server and the editor.
 */
export function plannableRuleProblem(input: { rrule: string; dtstart: string; tzid: string }): string | null {
  const invalid = validateRule(input.rrule)
  if (invalid) return invalid
  try {
    const first = expandRuleBounded({ ...input, limit: 1 }).occurrences[0]
    if (!first) {
      return `This rule gives no date in the ${searchReach(input.rrule)} after its start. Check BYSETPOS and the other BY… parts: for example BYSETPOS=2 picks a second time in each period, and FREQ=HOURLY;BYMINUTE=0 has only one.`
    }
    const to = new Date(Date.parse(first.utc) + RULE_LIMITS.horizonDays * DAY_MS - 1).toISOString()
    const window = expandRuleBounded({ ...input, from: first.utc, to, limit: RULE_LIMITS.maxPerHorizon + 1 })
    if (window.occurrences.length > RULE_LIMITS.maxPerHorizon || !window.complete) {
      return `This rule repeats too often to plan: Roundtide plans at most ${RULE_LIMITS.maxPerHorizon.toLocaleString('en')} tasks in ${RULE_LIMITS.horizonDays / 7} weeks (one every 15 minutes).`
    }
    return null
  } catch (error) {
    return error instanceof Error ? error.message : String(error)
  }
}
