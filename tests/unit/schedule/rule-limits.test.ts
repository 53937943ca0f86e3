import { describe, expect, it } from 'vitest'
import { expandRuleBounded } from '#shared/schedule/expand-rule'
import { plannableRuleProblem } from '#shared/schedule/plannable-rule'
import { RULE_LIMITS } from '#shared/schedule/rule-limits'

const zone = 'Europe/Berlin'

describe('every expansion is bounded', () => {
  it.each([
    'FREQ=HOURLY;BYSETPOS=2;BYMINUTE=0',
    'FREQ=HOURLY;BYSETPOS=2;BYMINUTE=0;BYHOUR=3,4', // stepping with an hour filter must never see a zero interval
    'FREQ=MINUTELY;BYHOUR=3;BYMINUTE=0;BYSETPOS=2', // carries into BYHOUR one hour at a time: allowed, bounded by the budget
    'FREQ=DAILY;BYSETPOS=2;BYHOUR=1',
    'FREQ=YEARLY;BYSETPOS=2;BYMONTH=2;BYMONTHDAY=29',
  ])('when %s never matches, then the walk stops at its work limit and reports it', (rrule) => {
    const result = expandRuleBounded({ rrule, dtstart: '2026-01-01T00:00:00', tzid: zone, limit: 1 })
    expect(result.occurrences).toEqual([])
    expect(result.complete).toBe(false)
  })

  it('when a rule has dates, then the bounded walk gives them and calls itself complete', () => {
    const result = expandRuleBounded({
      rrule: 'FREQ=DAILY;BYHOUR=9,14;BYMINUTE=0',
      dtstart: '2026-01-05T09:00:00',
      tzid: zone,
      to: '2026-01-07T23:00:00',
      limit: 100,
    })
    expect(result.occurrences.map((o) => o.local)).toEqual([
      '2026-01-05T09:00:00',
      '2026-01-05T14:00:00',
      '2026-01-06T09:00:00',
      '2026-01-06T14:00:00',
      '2026-01-07T09:00:00',
      '2026-01-07T14:00:00',
    ])
    expect(result.complete).toBe(true)
  })
})

describe('a routine started years ago is walked from just before the window, with the same dates', () => {
  // The reference walks from DTSTART with a budget large enough for the whole span.
  const reference = { maxSteps: 10_000_000 }
  it.each([
    ['FREQ=HOURLY;INTERVAL=3', '2016-03-07T08:20:00'],
    ['FREQ=WEEKLY;INTERVAL=2;BYDAY=TU,FR', '2015-06-02T10:00:00'],
    ['FREQ=MONTHLY', '2012-01-31T07:30:00'], // the 31st: months without one have no date
    ['FREQ=MONTHLY;INTERVAL=5;BYDAY=-1FR', '2011-05-27T16:00:00'],
    ['FREQ=YEARLY', '2012-02-29T09:00:00'], // a leap day repeats only in leap years
    ['FREQ=YEARLY;INTERVAL=2;BYMONTH=3,9;BYDAY=1MO', '2010-03-01T09:00:00'],
  ])('%s from %s', (rrule, dtstart) => {
    const window = { rrule, dtstart, tzid: zone, from: '2028-01-01T00:00:00Z', to: '2032-12-31T00:00:00Z', limit: 400 }
    const near = expandRuleBounded(window)
    expect(near.complete).toBe(true)
    expect(near.occurrences.length).toBeGreaterThan(0)
    expect(near.occurrences).toEqual(expandRuleBounded({ ...window, ...reference }).occurrences)
  })
})

describe('which rules Roundtide can plan', () => {
  const check = (rrule: string, dtstart = '2026-01-05T07:30:00') => plannableRuleProblem({ rrule, dtstart, tzid: zone })
  it('when a rule is ordinary, then there is no problem', () => {
    for (const rrule of ['FREQ=DAILY', 'FREQ=WEEKLY;BYDAY=MO,WE,FR', 'FREQ=MINUTELY;INTERVAL=15', 'FREQ=YEARLY;BYMONTH=2;BYMONTHDAY=29', 'FREQ=DAILY;COUNT=3'])
      expect(check(rrule)).toBeNull()
  })
  it('when a rule never matches, then the problem says how far it was searched', () => {
    expect(check('FREQ=HOURLY;BYSETPOS=2;BYMINUTE=0')).toMatch(/no date in the 208 days after its start/)
    expect(check('FREQ=DAILY;BYSETPOS=2;BYHOUR=1')).toMatch(/no date in the 13 years after its start/)
  })
  it('when a rule is denser than one task every 15 minutes over the horizon, then it is refused', () => {
    expect(check('FREQ=MINUTELY;INTERVAL=5')).toMatch(/at most 4,032 tasks in 6 weeks/)
    expect(check('FREQ=MINUTELY')).toMatch(/repeats too often/)
    expect(RULE_LIMITS.maxPerHorizon).toBe(RULE_LIMITS.horizonDays * 96)
  })
  it('when a rule is malformed, then the parse error is the problem', () => {
    expect(check('FREQ=HOURLY;BYHOUR=25')).toMatch(/BYHOUR=25/)
  })
})
