import { describe, expect, it } from 'vitest'
import { expandRuleBounded } from '#shared/schedule/expand-rule'
import { parseRule } from '#shared/schedule/parse-rule'
import { checkPlannableRule } from '#shared/schedule/plannable-rule'
import { RULE_LIMITS, stepsPerPeriod } from '#shared/schedule/rule-limits'
import { ALL_WORST_RULES, WORST_RULES } from '#tests/support/worst-rules'
import { rfcExamples } from './support/rfc5545-examples'

// What the rule check may cost, counted instead of timed so the test cannot flake on a busy
// machine. Per unit, as measured on this project's 2-core machine under load (record 12d;
// `npm run bench` measurement 9 times the same rules): about 5 µs per step of rrule's work and
// 2 µs per date placed in the zone. 50 ms is the longest a request may hold the event loop.
const STEP_MS = 0.005
const PLACED_MS = 0.002
const BLOCK_BUDGET_MS = 50

// Ordinary weeks, and weeks with the clocks changing in Oslo (forward 2031-03-30, back 2026-10-25):
// there a dense count looks past its limit for times moved forward by the gap.
const STARTS = ['2026-01-05T07:30:00', '2031-03-29T01:30:00', '2026-10-24T23:50:00']

describe('no rule check does more work than fits in 50 ms', () => {
  it.each(ALL_WORST_RULES.flatMap((rrule) => STARTS.map((dtstart) => [rrule.slice(0, 70), dtstart, rrule])))('%s from %s', (_, dtstart, rrule) => {
    const { problem, work } = checkPlannableRule({ rrule, dtstart, tzid: 'Europe/Oslo' })
    expect(work.steps * STEP_MS + work.placed * PLACED_MS).toBeLessThanOrEqual(BLOCK_BUDGET_MS)
    // The search for a first date and the count over the horizon share one budget (each walk may finish its last period).
    expect(work.steps).toBeLessThanOrEqual(RULE_LIMITS.maxSteps + 2 * stepsPerPeriod(parseRule(rrule).parts))
    if (WORST_RULES.atTheLimit.some((r) => r === rrule)) expect(problem).toBeNull()
    else if (!WORST_RULES.lateFirstDate.some((r) => r === rrule)) expect(problem).not.toBeNull()
  })

  it('an HOURLY period with 60 minutes × 6 seconds counts as 12 steps: rrule rebuilds its 360 times in every period', () => {
    expect(stepsPerPeriod(parseRule(WORST_RULES.bysetposOddities[0]).parts)).toBe(12)
    expect(stepsPerPeriod(parseRule('FREQ=HOURLY').parts)).toBe(1)
    expect(stepsPerPeriod(parseRule('FREQ=WEEKLY;BYDAY=MO').parts)).toBe(7)
  })
})

describe('which dense rules a routine may use', () => {
  const check = (rrule: string) => checkPlannableRule({ rrule, dtstart: '2026-01-05T07:30:00', tzid: 'Europe/Oslo' })

  it('FREQ=SECONDLY is refused before any walk: nobody does a care task every few seconds', () => {
    for (const rrule of ['FREQ=SECONDLY', 'FREQ=SECONDLY;BYHOUR=8;BYMINUTE=0;BYSECOND=0', 'FREQ=SECONDLY;INTERVAL=3600']) {
      const { problem, work } = check(rrule)
      expect(problem).toMatch(/plans tasks to the minute: FREQ=SECONDLY is not used for routines/)
      expect(work).toEqual({ steps: 0, placed: 0 })
    }
    // Expanding one directly (as the preview could) still refuses a rule rrule would loop on for ever.
    expect(() => expandRuleBounded({ rrule: 'FREQ=SECONDLY;BYMINUTE=53;BYMONTHDAY=30', dtstart: '2026-01-05T07:30:00', tzid: 'Europe/Oslo' })).toThrow(
      /cannot plan FREQ=SECONDLY with BYHOUR or BYMINUTE/,
    )
  })

  it('every 20 minutes from 9:00 to 16:40 (RFC 5545, both forms) is 24 a day, under one every 15 minutes, and stays allowed', () => {
    const twentyMinutes = rfcExamples.filter((example) => example.title.startsWith('Every 20 minutes from 9:00 AM to 4:40 PM'))
    expect(twentyMinutes.map((example) => example.input.rrule)).toContain('RRULE:FREQ=MINUTELY;INTERVAL=20;BYHOUR=9,10,11,12,13,14,15,16')
    for (const example of twentyMinutes) expect(checkPlannableRule(example.input).problem).toBeNull()
  })

  it('a rule whose first date comes after most of the budget is refused for the work, not called too dense', () => {
    expect(check('FREQ=DAILY;BYMONTH=2;BYMONTHDAY=29;BYDAY=SU').problem).toMatch(/cannot check this rule's first 6 weeks within its work limit/)
  })
})
