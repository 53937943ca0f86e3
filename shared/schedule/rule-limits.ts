import type { RRule } from './parse-rule'

type Rule = InstanceType<typeof RRule>

/**
 * Bounds on every expansion of a rule, so no rule can hold a server request or a browser tab.
 * rrule checks its end (UNTIL, COUNT, a window) only when a date matches: a rule that never
 * matches (FREQ=HOURLY;BYSETPOS=2;BYMINUTE=0) would otherwise be walked to the year 9999.
 */
export const RULE_LIMITS = {
  /**
   * Work one expansion may do, in days of candidates: an HOURLY, MINUTELY or DAILY period counts
   * one, a week 7, a month 31, a year 366. 5,000 is about 25 ms on one core (measured: about 5 µs
   * per day of candidates), 13 years of a DAILY to YEARLY rule or 208 days of an HOURLY one.
   */
  maxSteps: 5_000,
  /** How far an expansion without an end looks ahead, and how far the check for a first date searches. */
  searchYears: 20,
  /** The planning horizon tasks are materialised for. */
  horizonDays: 42,
  /** At most one task every 15 minutes on average over the horizon. */
  maxPerHorizon: 42 * 96,
} as const

/** What a walk has spent: `steps` of work so far, and whether it stopped at its budget. */
export type PeriodBudget = { exhausted: boolean; steps: number }

const STEPS_PER_PERIOD: Record<string, number> = { YEARLY: 366, MONTHLY: 31, WEEKLY: 7 }
// rrule rebuilds an HOURLY period's times (BYMINUTE × BYSECOND) and a MINUTELY period's
// (BYSECOND) in every period, about 0.12 µs each against about 4 µs for the period itself:
// 32 times cost one more step (FREQ=HOURLY with 60 minutes × 6 seconds and a BYSETPOS no period
// has took 0.2–0.4 s before these counted).
const TIMES_PER_STEP = 32

/** The work of one period of this rule, in steps (see RULE_LIMITS.maxSteps). */
export function stepsPerPeriod(parts: ReadonlyMap<string, string>): number {
  const freq = parts.get('FREQ') ?? ''
  const count = (name: string) => parts.get(name)?.split(',').length ?? 1
  const times = freq === 'HOURLY' ? count('BYMINUTE') * count('BYSECOND') : freq === 'MINUTELY' ? count('BYSECOND') : 1
  return (STEPS_PER_PERIOD[freq] ?? 1) + Math.floor(times / TIMES_PER_STEP)
}

/**
 * Makes rrule stop after `maxSteps` of work (periods times their steps), whether or not any date matched. rrule 2.8.1
 * reads `options.interval` once per period in its loop's stop check (`interval === 0` ends the
 * walk) and once more right after `options.freq` when stepping to the next period; only the stop
 * check is answered with 0 once the budget is spent, so stepping never sees a zero interval.
 * Pinned by tests/unit/schedule/rule-limits.test.ts.
 */
export function limitPeriods(rule: Rule, maxSteps: number, stepsEach: number): PeriodBudget {
  const budget: PeriodBudget = { exhausted: false, steps: 0 }
  let previousKey: PropertyKey | undefined
  rule.options = new Proxy(rule.options, {
    get(target, key, receiver) {
      const previous = previousKey
      previousKey = key
      const value: unknown = Reflect.get(target, key, receiver)
      if (key !== 'interval' || previous === 'freq') return value
      budget.steps += stepsEach
      if (budget.steps <= maxSteps) return value
      budget.exhausted = true
      return 0
    },
  })
  return budget
}
