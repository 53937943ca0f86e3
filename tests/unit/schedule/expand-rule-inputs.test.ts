import { describe, expect, it } from 'vitest'
import { expandRule } from '#shared/schedule/expand-rule'
import type { ExpandRuleInput } from '#shared/schedule/expand-rule'

const berlinMorning = { dtstart: '2025-01-01T09:00:00', tzid: 'Europe/Berlin' }
const localsOf = (input: ExpandRuleInput) => expandRule(input).map((occurrence) => occurrence.local)

// Expected values here are common practice / computed by hand (Berlin is UTC+01:00 in January,
// Sydney UTC+10:00 after 6 April 2025).
describe('expandRule inputs and bounds', () => {
  it('when the rule comes with or without the RRULE: prefix, in lower case or with a trailing semicolon, then the result is the same', () => {
    const plain = expandRule({ ...berlinMorning, rrule: 'FREQ=DAILY;COUNT=3' })
    expect(expandRule({ ...berlinMorning, rrule: 'RRULE:FREQ=DAILY;COUNT=3' })).toEqual(plain)
    expect(expandRule({ ...berlinMorning, rrule: ' rrule:freq=daily;count=3 ' })).toEqual(plain)
    expect(expandRule({ ...berlinMorning, rrule: 'FREQ=DAILY;COUNT=3;' })).toEqual(plain)
  })

  it('when UNTIL is given in UTC, then it is compared as an instant and includes an occurrence exactly at it', () => {
    expect(localsOf({ ...berlinMorning, rrule: 'FREQ=DAILY;UNTIL=20250103T080000Z' })).toEqual([
      '2025-01-01T09:00:00',
      '2025-01-02T09:00:00',
      '2025-01-03T09:00:00',
    ])
    expect(localsOf({ ...berlinMorning, rrule: 'FREQ=DAILY;UNTIL=20250103T075959Z' })).toHaveLength(2)
  })

  it('when UNTIL is given as local time or as a bare date, then it is read in the routine zone and the bare date covers that whole day', () => {
    expect(localsOf({ ...berlinMorning, rrule: 'FREQ=DAILY;UNTIL=20250103T090000' })).toHaveLength(3)
    expect(localsOf({ ...berlinMorning, rrule: 'FREQ=DAILY;UNTIL=20250103T085959' })).toHaveLength(2)
    expect(localsOf({ ...berlinMorning, rrule: 'FREQ=DAILY;UNTIL=20250103' })).toHaveLength(3)
  })

  it('when from and to are given as instants, then both ends are inclusive and compared in real time', () => {
    const sydney = { rrule: 'FREQ=DAILY', dtstart: '2025-04-01T07:30:00', tzid: 'Australia/Sydney' }
    expect(expandRule({ ...sydney, from: '2025-04-05T21:30:00Z', to: '2025-04-07T21:30:00Z' })).toEqual([
      { local: '2025-04-06T07:30:00', utc: '2025-04-05T21:30:00Z' },
      { local: '2025-04-07T07:30:00', utc: '2025-04-06T21:30:00Z' },
      { local: '2025-04-08T07:30:00', utc: '2025-04-07T21:30:00Z' },
    ])
    expect(localsOf({ ...sydney, from: '2025-04-06T07:30:00+10:00', to: '2025-04-06T07:30:00+10:00' })).toEqual(['2025-04-06T07:30:00'])
  })

  it('when from and to carry no offset, then they are read as wall time in the routine zone', () => {
    expect(localsOf({ ...berlinMorning, rrule: 'FREQ=DAILY', from: '2025-01-05T09:00:00', to: '2025-01-06T09:00:00' })).toEqual([
      '2025-01-05T09:00:00',
      '2025-01-06T09:00:00',
    ])
  })

  it('when COUNT is set and from starts later, then COUNT still counts from dtstart', () => {
    expect(localsOf({ ...berlinMorning, rrule: 'FREQ=DAILY;COUNT=5', from: '2025-01-03T00:00:00Z' })).toEqual([
      '2025-01-03T09:00:00',
      '2025-01-04T09:00:00',
      '2025-01-05T09:00:00',
    ])
  })

  it('when a rule never ends, then limit caps it, 1000 by default, and a limit of 0 gives nothing', () => {
    expect(localsOf({ ...berlinMorning, rrule: 'FREQ=DAILY', limit: 2 })).toEqual(['2025-01-01T09:00:00', '2025-01-02T09:00:00'])
    expect(expandRule({ ...berlinMorning, rrule: 'FREQ=HOURLY' })).toHaveLength(1000)
    expect(expandRule({ ...berlinMorning, rrule: 'FREQ=DAILY', limit: 0 })).toEqual([])
  })

  it('when from is after to, then there is nothing to return', () => {
    expect(expandRule({ ...berlinMorning, rrule: 'FREQ=DAILY', from: '2025-02-01T00:00:00Z', to: '2025-01-01T00:00:00Z' })).toEqual([])
  })

  it.each([
    ['an unknown time zone', { ...berlinMorning, rrule: 'FREQ=DAILY', tzid: 'Mars/Base' }, 'Unknown time zone "Mars/Base"'],
    [
      'a dtstart in the wrong format',
      { ...berlinMorning, rrule: 'FREQ=DAILY', dtstart: '2025-01-01 09:00' },
      'Invalid dtstart "2025-01-01 09:00": expected local time as YYYY-MM-DDTHH:mm:ss',
    ],
    [
      'a dtstart on a date that does not exist',
      { ...berlinMorning, rrule: 'FREQ=DAILY', dtstart: '2025-02-30T09:00:00' },
      'Invalid dtstart "2025-02-30T09:00:00": no such calendar date or time',
    ],
    ['an unknown FREQ', { ...berlinMorning, rrule: 'FREQ=FORTNIGHTLY' }, 'Invalid RRULE: FREQ=FORTNIGHTLY is not one of'],
    ['no FREQ', { ...berlinMorning, rrule: 'INTERVAL=2' }, 'Invalid RRULE: FREQ is required'],
    ['a misspelt weekday', { ...berlinMorning, rrule: 'FREQ=WEEKLY;BYDAY=MX' }, 'Invalid RRULE: BYDAY value "MX" is not a weekday'],
    ['an hour past 23', { ...berlinMorning, rrule: 'FREQ=DAILY;BYHOUR=24' }, 'Invalid RRULE: BYHOUR=24: expected whole numbers from 0 to 23'],
    ['both COUNT and UNTIL', { ...berlinMorning, rrule: 'FREQ=DAILY;COUNT=3;UNTIL=20250301T000000Z' }, 'Invalid RRULE: COUNT and UNTIL cannot both be given'],
    [
      'a day that never exists (30 February)',
      { ...berlinMorning, rrule: 'FREQ=YEARLY;BYMONTH=2;BYMONTHDAY=30' },
      'Invalid RRULE: BYMONTHDAY=30 never falls in BYMONTH=2',
    ],
    [
      'a DTSTART line inside the rule',
      { ...berlinMorning, rrule: 'DTSTART:20250101T090000\nRRULE:FREQ=DAILY' },
      'Invalid RRULE: expected a single RRULE value',
    ],
    ['an unreadable from', { ...berlinMorning, rrule: 'FREQ=DAILY', from: 'next tuesday' }, 'Invalid from "next tuesday"'],
    ['a negative limit', { ...berlinMorning, rrule: 'FREQ=DAILY', limit: -1 }, 'Invalid limit -1'],
  ])('when the input has %s, then it throws a message saying what is wrong', (_case, input, message) => {
    expect(() => expandRule(input)).toThrow(message)
  })
})
