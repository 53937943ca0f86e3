import { z } from 'zod'
import { text } from '#shared/schemas/text'

const WEEKDAY_ORDER = ['MO', 'TU', 'WE', 'TH', 'FR', 'SA', 'SU'] as const

export const weekdaySchema = z.enum(WEEKDAY_ORDER)
export const timeOfDaySchema = text().regex(/^([01]\d|2[0-3]):[0-5]\d$/, 'Use a 24-hour time such as 07:30')

const timesSchema = z.array(timeOfDaySchema).min(1, 'Add at least one time of day')
const daysSchema = z.array(weekdaySchema).min(1, 'Pick at least one weekday')
const intervalSchema = z.int().min(1).max(365)

/** The shapes the routine editor offers. Without `times`, the time of day comes from the start date-time. */
export const ruleSpecSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('dailyAtTimes'), times: timesSchema }),
  z.object({ kind: z.literal('weeklyOnDays'), days: daysSchema, times: timesSchema.optional() }),
  z.object({ kind: z.literal('everyNDays'), interval: intervalSchema, times: timesSchema.optional() }),
  z.object({
    kind: z.literal('everyNWeeksOnDays'),
    interval: intervalSchema,
    days: daysSchema,
    times: timesSchema.optional(),
  }),
  z.object({
    kind: z.literal('monthlyOnNthWeekday'),
    /** 1 to 4 count from the start of the month; -1 is the last such weekday. */
    nth: z.literal([1, 2, 3, 4, -1]),
    day: weekdaySchema,
    times: timesSchema.optional(),
  }),
  z.object({
    kind: z.literal('monthlyOnDayOfMonth'),
    /** 1 to 31, or -1 for the last day. Months without that day are skipped (RFC 5545). */
    dayOfMonth: z.union([z.int().min(1).max(31), z.literal(-1)]),
    times: timesSchema.optional(),
  }),
])

export type RuleSpec = z.infer<typeof ruleSpecSchema>
export type Weekday = z.infer<typeof weekdaySchema>

// RFC 5545 §3.3.10 caps BYSETPOS at 366
const MAX_SET_POSITION = 366

function sortedUnique<T>(items: readonly T[], order: (a: T, b: T) => number): T[] {
  return [...new Set(items)].sort(order)
}

function weekdayList(days: readonly Weekday[]): string {
  return sortedUnique(days, (a, b) => WEEKDAY_ORDER.indexOf(a) - WEEKDAY_ORDER.indexOf(b)).join(',')
}

/**
 * BYHOUR and BYMINUTE combine as a grid (every hour with every minute), so 07:30 and 19:00
 * would also give 07:00 and 19:30. When the wanted times are not a full grid, BYSETPOS
 * picks them from it: positions count through each period's days in order, one grid per day.
 */
function timesOfDayParts(times: readonly string[] | undefined, daysPerPeriod: number): string[] {
  if (!times) return []
  const wanted = sortedUnique(times, (a, b) => a.localeCompare(b))
  const hours = sortedUnique(
    wanted.map((time) => Number(time.slice(0, 2))),
    (a, b) => a - b,
  )
  const minutes = sortedUnique(
    wanted.map((time) => Number(time.slice(3))),
    (a, b) => a - b,
  )
  const parts = [`BYHOUR=${hours.join(',')}`, `BYMINUTE=${minutes.join(',')}`]
  const grid = hours.flatMap((hour) => minutes.map((minute) => `${String(hour).padStart(2, '0')}:${String(minute).padStart(2, '0')}`))
  if (grid.length === wanted.length) return parts
  const positionsInDay = wanted.map((time) => grid.indexOf(time) + 1)
  const positions = Array.from({ length: daysPerPeriod }, (_, day) => positionsInDay.map((position) => day * grid.length + position)).flat()
  if (positions[positions.length - 1] > MAX_SET_POSITION) {
    throw new Error('Too many different times of day for one rule: use fewer times or fewer weekdays')
  }
  return [...parts, `BYSETPOS=${positions.join(',')}`]
}

function intervalPart(interval: number): string[] {
  return interval > 1 ? [`INTERVAL=${interval}`] : []
}

function dayParts(spec: RuleSpec): { parts: string[]; daysPerPeriod: number } {
  switch (spec.kind) {
    case 'dailyAtTimes':
      return { parts: ['FREQ=DAILY'], daysPerPeriod: 1 }
    case 'weeklyOnDays':
      return { parts: ['FREQ=WEEKLY', `BYDAY=${weekdayList(spec.days)}`], daysPerPeriod: new Set(spec.days).size }
    case 'everyNDays':
      return { parts: ['FREQ=DAILY', ...intervalPart(spec.interval)], daysPerPeriod: 1 }
    case 'everyNWeeksOnDays':
      return {
        parts: ['FREQ=WEEKLY', ...intervalPart(spec.interval), `BYDAY=${weekdayList(spec.days)}`],
        daysPerPeriod: new Set(spec.days).size,
      }
    case 'monthlyOnNthWeekday':
      return { parts: ['FREQ=MONTHLY', `BYDAY=${spec.nth}${spec.day}`], daysPerPeriod: 1 }
    case 'monthlyOnDayOfMonth':
      return { parts: ['FREQ=MONTHLY', `BYMONTHDAY=${spec.dayOfMonth}`], daysPerPeriod: 1 }
  }
}

/** Builds an RRULE value (no `RRULE:` prefix) from the editor's form; throws on an invalid spec. */
export function buildRule(input: RuleSpec): string {
  const spec = ruleSpecSchema.parse(input)
  const { parts, daysPerPeriod } = dayParts(spec)
  return [...parts, ...timesOfDayParts(spec.times, daysPerPeriod)].join(';')
}
