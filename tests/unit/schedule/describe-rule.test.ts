import { describe, expect, it } from 'vitest'
import { describeRule, validateRule } from '#shared/schedule/describe-rule'

describe('describeRule', () => {
  it.each([
    ['FREQ=WEEKLY;BYDAY=MO,WE,FR', 'every week on Monday, Wednesday and Friday'],
    ['RRULE:FREQ=DAILY;BYHOUR=7,19;BYMINUTE=30', 'every day at 07:30 and 19:30'],
    ['FREQ=DAILY;INTERVAL=3', 'every 3 days'],
    ['FREQ=WEEKLY;INTERVAL=2;BYDAY=TU,TH', 'every 2 weeks on Tuesday and Thursday'],
    ['FREQ=MONTHLY;BYDAY=2TU', 'every month on the 2nd Tuesday'],
    ['FREQ=MONTHLY;BYDAY=-1FR;BYHOUR=9;BYMINUTE=0', 'every month on the last Friday at 09:00'],
    ['FREQ=MONTHLY;BYMONTHDAY=15', 'every month on the 15th'],
    ['FREQ=MONTHLY;BYMONTHDAY=-1;COUNT=3', 'every month on the last day for 3 times'],
    ['FREQ=YEARLY;BYMONTH=6,7,8;BYDAY=TH', 'every June, July and August on Thursday'],
    ['FREQ=DAILY;BYHOUR=7;BYMINUTE=30;UNTIL=20250301', 'every day at 07:30 until March 1, 2025'],
    ['FREQ=DAILY;BYHOUR=7,19;BYMINUTE=0,30;BYSETPOS=2,3', 'every day at 07:30 and 19:00'],
    ['FREQ=WEEKLY;BYDAY=MO,TH;BYHOUR=8,16;BYMINUTE=0,30;BYSETPOS=1,4,5,8', 'every week on Monday and Thursday at 08:00 and 16:30'],
  ])('when the rule is %s, then the editor reads "%s"', (rule, text) => {
    expect(describeRule(rule)).toBe(text)
  })

  it.each([
    // BYSETPOS beyond picking times: rrule's own text would drop it and say "every month on weekdays"
    ['a BYSETPOS over weekdays', 'FREQ=MONTHLY;BYDAY=MO,TU,WE,TH,FR;BYSETPOS=-2', 'FREQ=MONTHLY;BYDAY=MO,TU,WE,TH,FR;BYSETPOS=-2'],
    // the minute would come from the routine's start time, which the text cannot know
    ['BYHOUR without BYMINUTE', 'FREQ=DAILY;BYHOUR=8', 'FREQ=DAILY;BYHOUR=8'],
    ['a SECONDLY rule', 'RRULE:FREQ=SECONDLY', 'FREQ=SECONDLY'],
    ['counting back from the month end twice', 'FREQ=MONTHLY;BYMONTHDAY=-2,-1', 'FREQ=MONTHLY;BYMONTHDAY=-2,-1'],
    ['text that is not a rule', 'feed the fry', 'feed the fry'],
    ['an empty string', '', ''],
  ])('when the rule has %s, then it does not throw and shows the rule itself', (_case, rule, text) => {
    expect(describeRule(rule)).toBe(text)
  })
})

describe('validateRule', () => {
  it('when the rule is sound, then there is no message', () => {
    expect(validateRule('FREQ=WEEKLY;BYDAY=MO,WE,FR')).toBeNull()
    expect(validateRule('RRULE:FREQ=MONTHLY;BYDAY=-1FR;BYHOUR=9;BYMINUTE=0')).toBeNull()
  })

  it.each([
    ['', 'Invalid RRULE: the rule is empty'],
    ['FREQ=DAILY;FOO=1', 'Invalid RRULE: unknown part "FOO"'],
    ['FREQ=DAILY;COUNT=2;COUNT=3', 'Invalid RRULE: COUNT is given more than once'],
    ['FREQ=DAILY;INTERVAL=0', 'Invalid RRULE: INTERVAL=0: expected a whole number of at least 1'],
    ['FREQ=WEEKLY;BYDAY=2TU', 'Invalid RRULE: BYDAY with a position (like 2TU) needs FREQ=MONTHLY or FREQ=YEARLY'],
    ['FREQ=MONTHLY;BYDAY=6MO', 'Invalid RRULE: BYDAY=6MO asks for a weekday past the 5th in a month, so the rule has no dates'],
    ['FREQ=DAILY;UNTIL=2025-03-01', 'Invalid RRULE: UNTIL=2025-03-01 is not a date (YYYYMMDD) or date-time (YYYYMMDDTHHMMSS, optionally ending in Z)'],
    ['FREQ=MONTHLY;BYSETPOS=1', 'Invalid RRULE: BYSETPOS needs another BY... part to pick from'],
  ])('when the rule is "%s", then the message says "%s"', (rule, message) => {
    expect(validateRule(rule)).toBe(message)
  })
})
