import * as rruleNamespace from 'rrule'
import type { Options } from 'rrule'
import type { WallTime } from './zone-time'

type RRuleModule = typeof rruleNamespace
// rrule 2.8.1 ships CommonJS as "main" and ESM as "module": Node ESM (tsx) sees only a
// `default` export holding the CommonJS object, while Vite and Vitest see the named exports.
// Reflect.get keeps the bundler from warning that the ESM build has no default export.
const commonJsExports = Reflect.get(rruleNamespace, 'default') as RRuleModule | undefined
const rruleModule: RRuleModule = commonJsExports ?? rruleNamespace

export const RRule = rruleModule.RRule

/** UNTIL as written: UTC (`...Z`), local wall time, or a bare date. */
export type RuleUntil = WallTime & { isUtc: boolean; isDateOnly: boolean }

export type ParsedRule = {
  /** The rule value tidied: upper-cased, no `RRULE:` prefix, no empty parts. */
  value: string
  /** rrule's options, minus dtstart (which the caller supplies). */
  options: Partial<Options>
  parts: ReadonlyMap<string, string>
  until: RuleUntil | null
}

type NumberLimits = { min: number; max: number; signed?: boolean; single?: boolean }

// Ranges from RFC 5545 §3.3.10; rrule itself accepts out-of-range numbers silently
const NUMBER_PARTS: Record<string, NumberLimits> = {
  COUNT: { min: 1, max: Number.MAX_SAFE_INTEGER, single: true },
  INTERVAL: { min: 1, max: Number.MAX_SAFE_INTEGER, single: true },
  BYSECOND: { min: 0, max: 59 },
  BYMINUTE: { min: 0, max: 59 },
  BYHOUR: { min: 0, max: 23 },
  BYMONTHDAY: { min: 1, max: 31, signed: true },
  BYYEARDAY: { min: 1, max: 366, signed: true },
  BYWEEKNO: { min: 1, max: 53, signed: true },
  BYMONTH: { min: 1, max: 12 },
  BYSETPOS: { min: 1, max: 366, signed: true },
}
const OTHER_PARTS = ['FREQ', 'UNTIL', 'BYDAY', 'WKST']
const FREQUENCIES = ['YEARLY', 'MONTHLY', 'WEEKLY', 'DAILY', 'HOURLY', 'MINUTELY', 'SECONDLY']
const WEEKDAY = /^(?:[+-]?(\d{1,2}))?(MO|TU|WE|TH|FR|SA|SU)$/
const UNTIL = /^(\d{4})(\d{2})(\d{2})(?:T(\d{2})(\d{2})(\d{2})(Z)?)?$/

function fail(reason: string): never {
  throw new Error(`Invalid RRULE: ${reason}`)
}

function splitParts(value: string): Map<string, string> {
  const parts = new Map<string, string>()
  // a trailing or doubled ";" is a common slip when rules are pasted, so empty parts are skipped
  for (const part of value.split(';').filter((piece) => piece !== '')) {
    const [name, partValue, ...rest] = part.split('=')
    if (!name || !partValue || rest.length > 0) fail(`"${part}" is not written as NAME=VALUE`)
    if (!(name in NUMBER_PARTS) && !OTHER_PARTS.includes(name)) fail(`unknown part "${name}"`)
    if (parts.has(name)) fail(`${name} is given more than once`)
    parts.set(name, partValue)
  }
  return parts
}

function describeLimits(limits: NumberLimits): string {
  if (limits.single) return `a whole number of at least ${limits.min}`
  const sign = limits.signed ? '±' : ''
  return `whole numbers from ${sign}${limits.min} to ${sign}${limits.max}`
}

function checkNumbers(name: string, text: string, limits: NumberLimits): void {
  const items = text.split(',')
  if (limits.single && items.length > 1) fail(`${name} takes a single number`)
  for (const item of items) {
    const wellFormed = (limits.signed ? /^[+-]?\d+$/ : /^\d+$/).test(item)
    const size = Math.abs(Number(item))
    if (!wellFormed || size < limits.min || size > limits.max) fail(`${name}=${text}: expected ${describeLimits(limits)}`)
  }
}

function checkCombinations(parts: Map<string, string>): void {
  const freq = parts.get('FREQ') ?? ''
  const has = (name: string) => parts.has(name)
  const byDay = parts.get('BYDAY')?.split(',') ?? []
  for (const day of byDay) {
    const match = WEEKDAY.exec(day)
    if (!match) fail(`BYDAY value "${day}" is not a weekday such as MO, 2TU or -1FR`)
    const ordinal = match[1]
    if (ordinal !== undefined && (Number(ordinal) < 1 || Number(ordinal) > 53)) fail(`BYDAY value "${day}": positions go from 1 to 53`)
    if (ordinal !== undefined && freq !== 'MONTHLY' && freq !== 'YEARLY') {
      fail(`BYDAY with a position (like ${day}) needs FREQ=MONTHLY or FREQ=YEARLY`)
    }
  }
  if (has('WKST') && !/^(MO|TU|WE|TH|FR|SA|SU)$/.test(parts.get('WKST') ?? '')) fail('WKST must be a weekday such as MO')
  if (has('COUNT') && has('UNTIL')) fail('COUNT and UNTIL cannot both be given')
  if (has('BYWEEKNO') && freq !== 'YEARLY') fail('BYWEEKNO needs FREQ=YEARLY')
  if (has('BYMONTHDAY') && freq === 'WEEKLY') fail('BYMONTHDAY cannot be used with FREQ=WEEKLY')
  if (has('BYYEARDAY') && ['MONTHLY', 'WEEKLY', 'DAILY'].includes(freq)) fail(`BYYEARDAY cannot be used with FREQ=${freq}`)
  if (has('BYSETPOS') && ![...parts.keys()].some((name) => name.startsWith('BY') && name !== 'BYSETPOS')) {
    fail('BYSETPOS needs another BY... part to pick from')
  }
}

const LONGEST_MONTH_DAYS = [31, 29, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31]

// rrule only checks its end (UNTIL, a window) when a date matches, so a rule that never matches
// is walked up to year 9999 (seconds of work): catch the common impossible rules up front
function checkDatesExist(parts: Map<string, string>): void {
  const weekdays = parts.get('BYDAY')?.split(',') ?? []
  const pastFifth = (weekday: string) => Math.abs(parseInt(weekday, 10)) > 5
  if (parts.get('FREQ') === 'MONTHLY' && weekdays.length > 0 && weekdays.every(pastFifth)) {
    fail(`BYDAY=${parts.get('BYDAY')} asks for a weekday past the 5th in a month, so the rule has no dates`)
  }
  const monthDays =
    parts
      .get('BYMONTHDAY')
      ?.split(',')
      .map((day) => Math.abs(Number(day))) ?? []
  const months = parts.get('BYMONTH')?.split(',').map(Number) ?? []
  if (monthDays.length === 0 || months.length === 0) return
  const longest = Math.max(...months.map((month) => LONGEST_MONTH_DAYS[month - 1]))
  if (monthDays.every((day) => day > longest)) {
    fail(`BYMONTHDAY=${parts.get('BYMONTHDAY')} never falls in BYMONTH=${parts.get('BYMONTH')}, so the rule has no dates`)
  }
}

function parseUntil(text: string | undefined): RuleUntil | null {
  if (text === undefined) return null
  const match = UNTIL.exec(text)
  if (!match) fail(`UNTIL=${text} is not a date (YYYYMMDD) or date-time (YYYYMMDDTHHMMSS, optionally ending in Z)`)
  const [year, month, day, hour, minute, second] = match.slice(1, 7).map((field) => Number(field ?? 0))
  return { year, month, day, hour, minute, second, isUtc: match[7] === 'Z', isDateOnly: match[4] === undefined }
}

/** Parses and checks one RRULE value (with or without the `RRULE:` prefix). Throws a readable Error. */
export function parseRule(rrule: string): ParsedRule {
  const text = rrule
    .trim()
    .replace(/^RRULE:/i, '')
    .toUpperCase()
  if (/[\r\n]/.test(text)) fail('expected a single RRULE value, without DTSTART or other lines')
  const parts = splitParts(text)
  if (parts.size === 0) fail('the rule is empty')
  const value = [...parts].map(([name, partValue]) => `${name}=${partValue}`).join(';')
  const freq = parts.get('FREQ')
  if (freq === undefined) fail('FREQ is required (for example FREQ=DAILY)')
  if (!FREQUENCIES.includes(freq)) fail(`FREQ=${freq} is not one of ${FREQUENCIES.join(', ')}`)
  for (const [name, text] of parts) {
    const limits = NUMBER_PARTS[name]
    if (limits) checkNumbers(name, text, limits)
  }
  checkCombinations(parts)
  checkDatesExist(parts)
  const until = parseUntil(parts.get('UNTIL'))
  try {
    return { value, options: RRule.parseString(value), parts, until }
  } catch (error) {
    return fail(error instanceof Error ? error.message : String(error))
  }
}
