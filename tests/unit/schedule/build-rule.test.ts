import { describe, expect, it } from 'vitest'
import { buildRule } from '#shared/schedule/build-rule'
import type { RuleSpec } from '#shared/schedule/build-rule'
import { expandRule } from '#shared/schedule/expand-rule'

// Starts on Thursday 2 January 2025, 08:00 in Berlin (UTC+01:00). Expected dates are
// common practice / computed by hand from a 2025 calendar.
const localsFor = (rrule: string, limit: number) =>
  expandRule({ rrule, dtstart: '2025-01-02T08:00:00', tzid: 'Europe/Berlin', limit }).map((occurrence) => occurrence.local)

describe('buildRule', () => {
  it.each<[string, RuleSpec, string, string[]]>([
    [
      'a daily routine at 07:30 and 19:30',
      { kind: 'dailyAtTimes', times: ['19:30', '07:30'] },
      'FREQ=DAILY;BYHOUR=7,19;BYMINUTE=30',
      ['2025-01-02T19:30:00', '2025-01-03T07:30:00', '2025-01-03T19:30:00'],
    ],
    [
      // BYHOUR=7,19;BYMINUTE=0,30 alone would also give 07:00 and 19:30; BYSETPOS keeps the 2nd and 3rd
      'a daily routine at 07:30 and 19:00',
      { kind: 'dailyAtTimes', times: ['07:30', '19:00'] },
      'FREQ=DAILY;BYHOUR=7,19;BYMINUTE=0,30;BYSETPOS=2,3',
      ['2025-01-02T19:00:00', '2025-01-03T07:30:00', '2025-01-03T19:00:00', '2025-01-04T07:30:00'],
    ],
    [
      'a weekly routine on Monday, Wednesday and Friday',
      { kind: 'weeklyOnDays', days: ['FR', 'MO', 'WE'] },
      'FREQ=WEEKLY;BYDAY=MO,WE,FR',
      ['2025-01-03T08:00:00', '2025-01-06T08:00:00', '2025-01-08T08:00:00', '2025-01-10T08:00:00'],
    ],
    [
      'a weekly routine on Monday and Thursday at 08:00 and 16:30',
      { kind: 'weeklyOnDays', days: ['MO', 'TH'], times: ['08:00', '16:30'] },
      'FREQ=WEEKLY;BYDAY=MO,TH;BYHOUR=8,16;BYMINUTE=0,30;BYSETPOS=1,4,5,8',
      ['2025-01-02T08:00:00', '2025-01-02T16:30:00', '2025-01-06T08:00:00', '2025-01-06T16:30:00', '2025-01-09T08:00:00'],
    ],
    [
      'a routine every 3 days',
      { kind: 'everyNDays', interval: 3 },
      'FREQ=DAILY;INTERVAL=3',
      ['2025-01-02T08:00:00', '2025-01-05T08:00:00', '2025-01-08T08:00:00'],
    ],
    [
      'a routine every 2 weeks on Tuesday and Thursday',
      { kind: 'everyNWeeksOnDays', interval: 2, days: ['TH', 'TU'] },
      'FREQ=WEEKLY;INTERVAL=2;BYDAY=TU,TH',
      ['2025-01-02T08:00:00', '2025-01-14T08:00:00', '2025-01-16T08:00:00', '2025-01-28T08:00:00'],
    ],
    [
      'a monthly routine on the 2nd Tuesday',
      { kind: 'monthlyOnNthWeekday', nth: 2, day: 'TU' },
      'FREQ=MONTHLY;BYDAY=2TU',
      ['2025-01-14T08:00:00', '2025-02-11T08:00:00', '2025-03-11T08:00:00'],
    ],
    [
      'a monthly routine on the last Friday at 09:00',
      { kind: 'monthlyOnNthWeekday', nth: -1, day: 'FR', times: ['09:00'] },
      'FREQ=MONTHLY;BYDAY=-1FR;BYHOUR=9;BYMINUTE=0',
      ['2025-01-31T09:00:00', '2025-02-28T09:00:00', '2025-03-28T09:00:00'],
    ],
    [
      // RFC 5545: months without a 31st are skipped, not moved
      'a monthly routine on the 31st',
      { kind: 'monthlyOnDayOfMonth', dayOfMonth: 31 },
      'FREQ=MONTHLY;BYMONTHDAY=31',
      ['2025-01-31T08:00:00', '2025-03-31T08:00:00', '2025-05-31T08:00:00'],
    ],
    [
      'a monthly routine on the last day',
      { kind: 'monthlyOnDayOfMonth', dayOfMonth: -1 },
      'FREQ=MONTHLY;BYMONTHDAY=-1',
      ['2025-01-31T08:00:00', '2025-02-28T08:00:00', '2025-03-31T08:00:00'],
    ],
  ])('when the editor asks for %s, then it writes the expected RRULE and it lands on the expected dates', (_case, spec, rule, dates) => {
    expect(buildRule(spec)).toBe(rule)
    expect(localsFor(rule, dates.length)).toEqual(dates)
  })

  it.each([
    ['an interval of 0', { kind: 'everyNDays', interval: 0 }],
    ['a time of 25:00', { kind: 'dailyAtTimes', times: ['25:00'] }],
    ['no times at all', { kind: 'dailyAtTimes', times: [] }],
    ['a 5th Tuesday', { kind: 'monthlyOnNthWeekday', nth: 5, day: 'TU' }],
    ['no weekdays', { kind: 'weeklyOnDays', days: [] }],
  ])('when the form holds %s, then buildRule refuses it', (_case, spec) => {
    expect(() => buildRule(spec as unknown as RuleSpec)).toThrow()
  })
})
