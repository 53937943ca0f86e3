import fc from 'fast-check'

const pad = (n: number, width = 2) => String(n).padStart(width, '0')
const daysIn = (year: number, month: number) => new Date(Date.UTC(year, month, 0)).getUTCDate()
const isLeap = (year: number) => daysIn(year, 2) === 29

/**
 * Text that is not text: ordinary characters around half of a UTF-16 pair on its own. A low
 * half never pairs with what follows, and a high half is followed by nothing or ASCII here.
 */
export const malformedText = fc
  .tuple(fc.string({ maxLength: 12 }), fc.integer({ min: 0xd800, max: 0xdfff }), fc.string({ maxLength: 12 }))
  .map(([before, half, after]) => `${before}${String.fromCharCode(half)}${after}`)

/** YYYY-MM-DD strings of the right shape naming no day: past the month's end, month 00 or 13+, day 00, 29 February off leap years. */
export const impossibleDate = fc.oneof(
  fc
    .record({ year: fc.integer({ min: 1990, max: 2100 }), month: fc.integer({ min: 1, max: 12 }) })
    .chain(({ year, month }) => fc.integer({ min: daysIn(year, month) + 1, max: 39 }).map((day) => `${year}-${pad(month)}-${pad(day)}`)),
  fc
    .record({ year: fc.integer({ min: 1990, max: 2100 }), month: fc.constantFrom(0, 13, 14, 19, 99), day: fc.integer({ min: 1, max: 28 }) })
    .map((d) => `${d.year}-${pad(d.month)}-${pad(d.day)}`),
  fc.record({ year: fc.integer({ min: 1990, max: 2100 }), month: fc.integer({ min: 1, max: 12 }) }).map((d) => `${d.year}-${pad(d.month)}-00`),
  fc
    .integer({ min: 1990, max: 2100 })
    .filter((y) => !isLeap(y))
    .map((y) => `${y}-02-29`),
  fc.constantFrom('2026-02-30', '2026-13-01', '2026-04-31', '2027-02-29', '2026-00-10', '2026-06-31', '2026-09-31', '2026-11-31'),
)

/** A real day with a time that does not exist (24:00, minute 60, second 60), written in the given shape (`T07:30:00`, `T07:30:00.000Z` …). */
export const impossibleWallTime = (shape: string) =>
  fc
    .record({ hour: fc.integer({ min: 0, max: 30 }), minute: fc.integer({ min: 0, max: 99 }), second: fc.integer({ min: 0, max: 99 }) })
    .filter(({ hour, minute, second }) => hour > 23 || minute > 59 || (shape.length > 6 && second > 59))
    .map(({ hour, minute, second }) => {
      const time = shape.length > 6 ? `${pad(hour)}:${pad(minute)}:${pad(second)}` : `${pad(hour)}:${pad(minute)}`
      return `2026-03-31T${time}${shape.slice(9)}`
    })

const FREQS = ['SECONDLY', 'MINUTELY', 'HOURLY', 'DAILY', 'WEEKLY', 'MONTHLY', 'YEARLY'] as const
const list = (values: fc.Arbitrary<number | string>) => fc.uniqueArray(values, { minLength: 1, maxLength: 4 }).map((xs) => xs.join(','))
const DAYS = ['MO', 'TU', 'WE', 'TH', 'FR', 'SA', 'SU']

/**
 * RRULE parts that make rules never match or match densely: positions no period has, days
 * no month has (BYMONTH=2;BYMONTHDAY=30), week numbers, huge intervals, every second.
 */
const rulePart = fc.oneof(
  list(fc.oneof(fc.integer({ min: 1, max: 400 }), fc.integer({ min: -400, max: -1 }))).map((v) => `BYSETPOS=${v}`),
  list(fc.integer({ min: 0, max: 59 })).map((v) => `BYMINUTE=${v}`),
  list(fc.integer({ min: 0, max: 59 })).map((v) => `BYSECOND=${v}`),
  list(fc.integer({ min: 0, max: 23 })).map((v) => `BYHOUR=${v}`),
  list(fc.tuple(fc.constantFrom('', '1', '2', '-1', '5', '53'), fc.constantFrom(...DAYS)).map(([n, d]) => `${n}${d}`)).map((v) => `BYDAY=${v}`),
  list(fc.oneof(fc.integer({ min: 28, max: 31 }), fc.integer({ min: -31, max: -1 }), fc.integer({ min: 1, max: 27 }))).map((v) => `BYMONTHDAY=${v}`),
  list(fc.integer({ min: 1, max: 12 })).map((v) => `BYMONTH=${v}`),
  list(fc.oneof(fc.integer({ min: 1, max: 366 }), fc.integer({ min: -366, max: -1 }))).map((v) => `BYYEARDAY=${v}`),
  list(fc.oneof(fc.integer({ min: 1, max: 53 }), fc.integer({ min: -53, max: -1 }))).map((v) => `BYWEEKNO=${v}`),
  fc.oneof(fc.integer({ min: 1, max: 12 }), fc.integer({ min: 13, max: 100_000 })).map((v) => `INTERVAL=${v}`),
  fc.integer({ min: 1, max: 100_000 }).map((v) => `COUNT=${v}`),
  fc.constantFrom('UNTIL=20261231T000000Z', 'UNTIL=20260105T000000Z', 'UNTIL=99991231T235959Z', 'WKST=SU'),
)

export const odditiesRule = fc
  .tuple(fc.constantFrom(...FREQS), fc.uniqueArray(rulePart, { maxLength: 4, selector: (p) => p.split('=')[0] }))
  .map(([freq, parts]) => [`FREQ=${freq}`, ...parts].join(';'))
