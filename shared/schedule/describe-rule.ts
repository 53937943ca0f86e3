import { RRule, parseRule } from './parse-rule'
import type { ParsedRule } from './parse-rule'

/** Returns a readable reason why the RRULE value cannot be used, or null when it is fine. */
export function validateRule(rrule: string): string | null {
  try {
    parseRule(rrule)
    return null
  } catch (error) {
    return error instanceof Error ? error.message : String(error)
  }
}

// Parts rrule's toText() renders faithfully; with anything else (BYSETPOS, for one) it prints
// a sentence that silently drops the part, so the raw rule is shown instead.
const PARTS_RRULE_DESCRIBES = ['FREQ', 'INTERVAL', 'COUNT', 'UNTIL', 'WKST', 'BYDAY', 'BYMONTHDAY', 'BYMONTH']
const PARTS_WE_DESCRIBE = ['BYHOUR', 'BYMINUTE']
const FREQUENCIES_WITH_DAY_TIMES = ['YEARLY', 'MONTHLY', 'WEEKLY', 'DAILY']
const NAMES_IN_LISTS =
  'Monday|Tuesday|Wednesday|Thursday|Friday|Saturday|Sunday|January|February|March|April|May|June|July|August|September|October|November|December'
// rrule writes "Monday, Wednesday, Friday"; English wants "Monday, Wednesday and Friday"
const LIST_OF_NAMES = new RegExp(`(?:(?:the )?(?:\\d+(?:st|nd|rd|th) |last )?(?:${NAMES_IN_LISTS}), )+(?:the )?(?:\\d+(?:st|nd|rd|th) |last )?(?:${NAMES_IN_LISTS})`, 'g')

function isDescribable(rule: ParsedRule): boolean {
  const names = [...rule.parts.keys()]
  const freq = rule.parts.get('FREQ') ?? ''
  if (!names.every((name) => PARTS_RRULE_DESCRIBES.includes(name) || PARTS_WE_DESCRIBE.includes(name))) return false
  if (rule.parts.has('BYMINUTE') && !rule.parts.has('BYHOUR')) return false
  return !rule.parts.has('BYHOUR') || FREQUENCIES_WITH_DAY_TIMES.includes(freq)
}

function joinWithAnd(items: string[]): string {
  return items.length < 2 ? items.join('') : `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`
}

function numbersOf(text: string | undefined): number[] {
  return (text ?? '').split(',').filter(Boolean).map(Number)
}

function describeTimesOfDay(rule: ParsedRule): string {
  const hours = numbersOf(rule.parts.get('BYHOUR')).sort((a, b) => a - b)
  if (hours.length === 0) return ''
  const minutes = numbersOf(rule.parts.get('BYMINUTE') ?? '0').sort((a, b) => a - b)
  const pad = (value: number) => String(value).padStart(2, '0')
  const times = hours.flatMap((hour) => minutes.map((minute) => `${pad(hour)}:${pad(minute)}`))
  return ` at ${joinWithAnd(times)}`
}

/**
 * A plain-English summary of an RRULE value for the routine editor, for example
 * "every week on Monday, Wednesday and Friday at 07:30". Never throws: a rule it cannot
 * put into words faithfully comes back as the rule itself.
 */
export function describeRule(rrule: string): string {
  let rule: ParsedRule
  try {
    rule = parseRule(rrule)
  } catch {
    return rrule.trim()
  }
  if (!isDescribable(rule)) return rule.value
  try {
    const { byhour: _byhour, byminute: _byminute, ...dayOptions } = rule.options
    const dayText = new RRule(dayOptions).toText()
    const listed = dayText.replace(LIST_OF_NAMES, (list) => joinWithAnd(list.split(', ')))
    return listed + describeTimesOfDay(rule)
  } catch {
    return rule.value
  }
}
