import type { ExpandRuleInput, Occurrence } from '#shared/schedule/expand-rule'

export type DstScenario = { story: string; input: ExpandRuleInput; expected: Occurrence[] }

const at = (local: string, utc: string): Occurrence => ({ local, utc })

/*
 * Transition dates come from the IANA rules for each zone. Expected instants are common
 * practice / computed by hand (local time minus the UTC offset in force), except the
 * America/New_York pair, which are the worked examples printed in RFC 5545 §3.3.5.
 *
 * Europe/Berlin 2025: CET +01:00 -> CEST +02:00 on 30 March at 02:00 (02:00-02:59 never
 * happens); back to CET on 26 October at 03:00 (02:00-02:59 happens twice).
 * Australia/Sydney 2025: AEDT +11:00 -> AEST +10:00 on 6 April at 03:00 (02:00-02:59 twice);
 * back to AEDT on 5 October at 02:00 (02:00-02:59 never happens).
 */
export const dstScenarios: DstScenario[] = [
  {
    story: 'when a daily 07:30 feed crosses the spring-forward day in Berlin, then it stays at 07:30 local and runs an hour earlier in UTC',
    input: { rrule: 'FREQ=DAILY;COUNT=4', dtstart: '2025-03-28T07:30:00', tzid: 'Europe/Berlin' },
    expected: [
      at('2025-03-28T07:30:00', '2025-03-28T06:30:00Z'),
      at('2025-03-29T07:30:00', '2025-03-29T06:30:00Z'),
      at('2025-03-30T07:30:00', '2025-03-30T05:30:00Z'),
      at('2025-03-31T07:30:00', '2025-03-31T05:30:00Z'),
    ],
  },
  {
    story: 'when a daily 07:30 feed crosses the fall-back day in Berlin, then it stays at 07:30 local and runs an hour later in UTC',
    input: { rrule: 'FREQ=DAILY;COUNT=3', dtstart: '2025-10-25T07:30:00', tzid: 'Europe/Berlin' },
    expected: [
      at('2025-10-25T07:30:00', '2025-10-25T05:30:00Z'),
      at('2025-10-26T07:30:00', '2025-10-26T06:30:00Z'),
      at('2025-10-27T07:30:00', '2025-10-27T06:30:00Z'),
    ],
  },
  {
    story: 'when a daily 02:30 check lands in the hour Berlin skips in spring, then that day it moves forward by the gap to 03:30',
    input: { rrule: 'FREQ=DAILY;COUNT=3', dtstart: '2025-03-29T02:30:00', tzid: 'Europe/Berlin' },
    expected: [
      at('2025-03-29T02:30:00', '2025-03-29T01:30:00Z'),
      at('2025-03-30T03:30:00', '2025-03-30T01:30:00Z'),
      at('2025-03-31T02:30:00', '2025-03-31T00:30:00Z'),
    ],
  },
  {
    story: 'when a daily 02:30 check lands in the hour Berlin repeats in autumn, then it runs once, at the first 02:30 (summer time)',
    input: { rrule: 'FREQ=DAILY;COUNT=3', dtstart: '2025-10-25T02:30:00', tzid: 'Europe/Berlin' },
    expected: [
      at('2025-10-25T02:30:00', '2025-10-25T00:30:00Z'),
      at('2025-10-26T02:30:00', '2025-10-26T00:30:00Z'),
      at('2025-10-27T02:30:00', '2025-10-27T01:30:00Z'),
    ],
  },
  {
    story: 'when a half-hourly round passes through the hour Berlin skips, then the shifted times merge with the real ones instead of appearing twice',
    // 02:00 and 02:30 move to 03:00 and 03:30, which the rule also gives; RFC 5545 §3.8.5.3:
    // "Duplicate instances are ignored."
    input: { rrule: 'FREQ=MINUTELY;INTERVAL=30;COUNT=6', dtstart: '2025-03-30T01:00:00', tzid: 'Europe/Berlin' },
    expected: [
      at('2025-03-30T01:00:00', '2025-03-30T00:00:00Z'),
      at('2025-03-30T01:30:00', '2025-03-30T00:30:00Z'),
      at('2025-03-30T03:00:00', '2025-03-30T01:00:00Z'),
      at('2025-03-30T03:30:00', '2025-03-30T01:30:00Z'),
    ],
  },
  {
    story: 'when a routine starts at 01:30 on the New York fall-back day, then it means 01:30 EDT, the first one (RFC 5545 §3.3.5 example)',
    input: { rrule: 'FREQ=DAILY;COUNT=1', dtstart: '2007-11-04T01:30:00', tzid: 'America/New_York' },
    expected: [at('2007-11-04T01:30:00', '2007-11-04T05:30:00Z')],
  },
  {
    story: 'when a routine starts at 02:30 on the New York spring-forward day, then it means 03:30 EDT (RFC 5545 §3.3.5 example)',
    input: { rrule: 'FREQ=DAILY;COUNT=1', dtstart: '2007-03-11T02:30:00', tzid: 'America/New_York' },
    expected: [at('2007-03-11T03:30:00', '2007-03-11T07:30:00Z')],
  },
  {
    story: 'when a daily 07:30 feed crosses the April fall-back day in Sydney, then it stays at 07:30 local and runs an hour later in UTC',
    input: { rrule: 'FREQ=DAILY;COUNT=3', dtstart: '2025-04-05T07:30:00', tzid: 'Australia/Sydney' },
    expected: [
      at('2025-04-05T07:30:00', '2025-04-04T20:30:00Z'),
      at('2025-04-06T07:30:00', '2025-04-05T21:30:00Z'),
      at('2025-04-07T07:30:00', '2025-04-06T21:30:00Z'),
    ],
  },
  {
    story: 'when a daily 07:30 feed crosses the October spring-forward day in Sydney, then it stays at 07:30 local and runs an hour earlier in UTC',
    input: { rrule: 'FREQ=DAILY;COUNT=3', dtstart: '2025-10-04T07:30:00', tzid: 'Australia/Sydney' },
    expected: [
      at('2025-10-04T07:30:00', '2025-10-03T21:30:00Z'),
      at('2025-10-05T07:30:00', '2025-10-04T20:30:00Z'),
      at('2025-10-06T07:30:00', '2025-10-05T20:30:00Z'),
    ],
  },
  {
    story: 'when a daily 02:30 check lands in the hour Sydney skips in October, then that day it moves forward by the gap to 03:30',
    input: { rrule: 'FREQ=DAILY;COUNT=3', dtstart: '2025-10-04T02:30:00', tzid: 'Australia/Sydney' },
    expected: [
      at('2025-10-04T02:30:00', '2025-10-03T16:30:00Z'),
      at('2025-10-05T03:30:00', '2025-10-04T16:30:00Z'),
      at('2025-10-06T02:30:00', '2025-10-05T15:30:00Z'),
    ],
  },
  {
    story: 'when a daily 02:30 check lands in the hour Sydney repeats in April, then it runs once, at the first 02:30 (daylight time)',
    input: { rrule: 'FREQ=DAILY;COUNT=3', dtstart: '2025-04-05T02:30:00', tzid: 'Australia/Sydney' },
    expected: [
      at('2025-04-05T02:30:00', '2025-04-04T15:30:00Z'),
      at('2025-04-06T02:30:00', '2025-04-05T15:30:00Z'),
      at('2025-04-07T02:30:00', '2025-04-06T16:30:00Z'),
    ],
  },
]
