import { validateRule } from './describe-rule'
import { expandRuleInstants, type RuleWork } from './expand-rule'
import { parseRule } from './parse-rule'
import { RULE_LIMITS, stepsPerPeriod } from './rule-limits'
import { DAY_MS } from './zone-time'

const PERIOD_DAYS: Record<string, number> = { YEARLY: 365.25, MONTHLY: 30.44, WEEKLY: 7, DAILY: 1, HOURLY: 1 / 24, MINUTELY: 1 / 1440, SECONDLY: 1 / 86_400 }

/** How far after its start a rule is searched for a first date, in words ("13 years", "208 days"). */
function searchReach(rrule: string): string {
  const rule = parseRule(rrule)
  const freq = rule.parts.get('FREQ') ?? 'DAILY'
  const periods = RULE_LIMITS.maxSteps / stepsPerPeriod(rule.parts)
  const days = Math.min(RULE_LIMITS.searchYears * 365.25, periods * PERIOD_DAYS[freq] * Number(rule.parts.get('INTERVAL') ?? 1))
  if (days >= 730) return `${Math.floor(days / 365.25)} years`
  if (days >= 2) return `${Math.floor(days)} days`
  return `${Math.max(1, Math.floor(days * 24))} hours`
}

type RuleInput = { rrule: string; dtstart: string; tzid: string }

/**
 * Why Roundtide cannot plan tasks from this rule, or null when it can: the rule must be valid,
 * give a first date within a bounded search after its start, and give at most one task every
 * 15 minutes on average over the planning horizon. Used by the server and the editor.
 */
export function plannableRuleProblem(input: RuleInput): string | null {
  return checkPlannableRule(input).problem
}

/**
 * plannableRuleProblem with the work it took. The search for a first date and the count over the
 * horizon share one budget of RULE_LIMITS.maxSteps, and the count stops at one date over the
 * limit, so a check costs at most maxSteps of rrule's work (about 25 ms) plus placing 4,033 dates
 * in the zone (a few ms): no rule can hold the server for longer (record 12d).
 */
export function checkPlannableRule(input: RuleInput): { problem: string | null; work: RuleWork } {
  const work: RuleWork = { steps: 0, placed: 0 }
  const answer = (problem: string | null) => ({ problem, work })
  const invalid = validateRule(input.rrule)
  if (invalid) return answer(invalid)
  try {
    if (parseRule(input.rrule).parts.get('FREQ') === 'SECONDLY') return answer(SECONDLY_REFUSED)
    const first = expandRuleInstants({ ...input, limit: 1 })
    addWork(work, first.work)
    if (first.instants.length === 0) {
      return answer(
        `This rule gives no date in the ${searchReach(input.rrule)} after its start. Check BYSETPOS and the other BY… parts: for example BYSETPOS=2 picks a second time in each period, and FREQ=HOURLY;BYMINUTE=0 has only one.`,
      )
    }
    const from = first.instants[0]
    const horizon = { from: new Date(from).toISOString(), to: new Date(from + RULE_LIMITS.horizonDays * DAY_MS - 1).toISOString() }
    const window = expandRuleInstants({ ...input, ...horizon, limit: RULE_LIMITS.maxPerHorizon + 1, maxSteps: RULE_LIMITS.maxSteps - first.work.steps })
    addWork(work, window.work)
    if (window.instants.length > RULE_LIMITS.maxPerHorizon) {
      return answer(
        `This rule repeats too often to plan: Roundtide plans at most ${RULE_LIMITS.maxPerHorizon.toLocaleString('en')} tasks in ${RULE_LIMITS.horizonDays / 7} weeks (one every 15 minutes).`,
      )
    }
    if (!window.complete) {
      return answer(
        `Roundtide cannot check this rule's first ${RULE_LIMITS.horizonDays / 7} weeks within its work limit: its first date comes long after its start, or most of its periods have no date. Move the start nearer to the first date, or use a larger FREQ.`,
      )
    }
    return answer(null)
  } catch (error) {
    return answer(error instanceof Error ? error.message : String(error))
  }
}

const SECONDLY_REFUSED =
  'Roundtide plans tasks to the minute: FREQ=SECONDLY is not used for routines, since nobody can do a care task every few seconds. For times within the day use FREQ=DAILY with BYHOUR and BYMINUTE.'

function addWork(total: RuleWork, more: RuleWork) {
  total.steps += more.steps
  total.placed += more.placed
}
