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

// Parts rrule's toText() renders faithfully; with anything else (BYSECOND, or BYSETPOS beyond
// picking times of day) it prints a sentence that silently drops the part, so the raw rule is
// shown instead.
const PARTS_RRULE_DESCRIBES = ['FREQ', 'INTERVAL', 'COUNT', 'UNTIL', 'WKST', 'BYDAY', 'BYMONTHDAY', 'BYMONTH']
const PARTS_RRULE_DESCRIBES_WHEN_YEARLY = ['BYWEEKNO', 'BYYEARDAY']
const PARTS_DESCRIBED_HERE = ['BYHOUR', 'BYMINUTE', 'BYSETPOS']
const FREQUENCIES_WITH_TIMES_OF_DAY = ['YEARLY', 'MONTHLY', 'WEEKLY', 'DAILY']
const WEEKDAYS = 'Monday|Tuesday|Wednesday|Thursday|Friday|Saturday|Sunday'
const MONTHS = 'January|February|March|April|May|June|July|August|September|October|November|December'
const NAME = `(?:the )?(?:\\d+(?:st|nd|rd|th) |last )?(?:${WEEKDAYS}|${MONTHS})`
// rrule writes "Monday, Wednesday, Friday" and "June and July and August"
const LIST_OF_NAMES = new RegExp(`(?:${NAME}(?:, | and ))+${NAME}`, 'g')
// rrule writes BYMONTHDAY=-1 as "on the last", with no noun
const LAST_WITHOUT_DAY = /\bon the last(?= for | until |$)/

function numbersOf(text: string | undefined): number[] {
  return (text ?? '')
    .split(',')
    .filter(Boolean)
    .map(Number)
    .sort((a, b) => a - b)
}

function joinWithAnd(items: string[]): string {
  return items.length < 2 ? items.join('') : `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`
}

/** How many days each DAILY/WEEKLY/MONTHLY period holds, when that is fixed; otherwise null. */
function daysPerPeriod(rule: ParsedRule): number | null {
  const weekdays = rule.parts.get('BYDAY')?.split(',') ?? []
  const monthDays = rule.parts.get('BYMONTHDAY')?.split(',') ?? []
  switch (rule.parts.get('FREQ')) {
    case 'DAILY':
      return 1
    case 'WEEKLY':
      return Math.max(weekdays.length, 1)
    case 'MONTHLY':
      return weekdays.length + monthDays.length === 1 && !/^(MO|TU|WE|TH|FR|SA|SU)$/.test(weekdays[0] ?? '') ? 1 : null
    default:
      return null
  }
}

/**
 * The times of day from the BYHOUR × BYMINUTE grid, narrowed by BYSETPOS when it has the
 * shape buildRule writes (the same positions in every day's grid). Null for any other shape.
 */
function timesOfDay(rule: ParsedRule): string[] | null {
  const pad = (value: number) => String(value).padStart(2, '0')
  const minutes = numbersOf(rule.parts.get('BYMINUTE'))
  const grid = numbersOf(rule.parts.get('BYHOUR')).flatMap((hour) => minutes.map((minute) => `${pad(hour)}:${pad(minute)}`))
  const positions = numbersOf(rule.parts.get('BYSETPOS'))
  if (positions.length === 0) return grid
  const days = daysPerPeriod(rule)
  if (days === null) return null
  const picked = grid.filter((_, index) => positions.includes(index + 1))
  const pickedEveryDay = Array.from({ length: days }, (_, day) => picked.map((time) => day * grid.length + grid.indexOf(time) + 1))
  return pickedEveryDay.flat().join(',') === positions.join(',') ? picked : null
}

function isDescribable(rule: ParsedRule): boolean {
  const freq = rule.parts.get('FREQ') ?? ''
  const known = [...PARTS_RRULE_DESCRIBES, ...PARTS_DESCRIBED_HERE, ...(freq === 'YEARLY' ? PARTS_RRULE_DESCRIBES_WHEN_YEARLY : [])]
  if (freq === 'SECONDLY' || ![...rule.parts.keys()].every((name) => known.includes(name))) return false
  // with only one of the two, the other comes from DTSTART, which is not known here
  if (rule.parts.has('BYMINUTE') !== rule.parts.has('BYHOUR')) return false
  if (rule.parts.has('BYHOUR') && (!FREQUENCIES_WITH_TIMES_OF_DAY.includes(freq) || timesOfDay(rule) === null)) return false
  if (rule.parts.has('BYSETPOS') && !rule.parts.has('BYHOUR')) return false
  // other counts from the month's end come out garbled ("the 1st and last", "2nd last")
  const monthDays = rule.parts.get('BYMONTHDAY') ?? ''
  return !monthDays.includes('-') || monthDays === '-1'
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
    const dayText = new RRule({ ...rule.options, byhour: null, byminute: null, bysetpos: null }).toText()
    const readable = dayText.replace(LIST_OF_NAMES, (list) => joinWithAnd(list.split(/, | and /))).replace(LAST_WITHOUT_DAY, 'on the last day')
    // times of day read best before the "for 3 times" / "until ..." ending
    const ending = / (?:for \d+ times?|until .+)$/.exec(readable)?.[0] ?? ''
    const times = rule.parts.has('BYHOUR') ? ` at ${joinWithAnd(timesOfDay(rule) ?? [])}` : ''
    return readable.slice(0, readable.length - ending.length) + times + ending
  } catch {
    return rule.value
  }
}
