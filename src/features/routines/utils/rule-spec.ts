import { buildRule, ruleSpecSchema, type RuleSpec, type Weekday } from '#shared/schedule/build-rule'
import { parseRule } from '#shared/schedule/parse-rule'

export type RuleKind = RuleSpec['kind']
export type NthWeek = 1 | 2 | 3 | 4 | -1

/** Everything the builder can hold at once, so switching shapes keeps the days and times typed so far. */
export type RuleDraft = {
  kind: RuleKind
  times: string[]
  days: Weekday[]
  interval: number
  nth: NthWeek
  day: Weekday
  dayOfMonth: number
}

export const WEEKDAYS: ReadonlyArray<{ code: Weekday; short: string; long: string }> = [
  { code: 'MO', short: 'Mon', long: 'Monday' },
  { code: 'TU', short: 'Tue', long: 'Tuesday' },
  { code: 'WE', short: 'Wed', long: 'Wednesday' },
  { code: 'TH', short: 'Thu', long: 'Thursday' },
  { code: 'FR', short: 'Fri', long: 'Friday' },
  { code: 'SA', short: 'Sat', long: 'Saturday' },
  { code: 'SU', short: 'Sun', long: 'Sunday' },
]

export const RULE_KIND_LABELS: Record<RuleKind, string> = {
  dailyAtTimes: 'Every day at set times',
  weeklyOnDays: 'Every week on chosen days',
  everyNDays: 'Every few days',
  everyNWeeksOnDays: 'Every few weeks on chosen days',
  monthlyOnNthWeekday: 'Monthly on a weekday (e.g. 1st Monday)',
  monthlyOnDayOfMonth: 'Monthly on a day of the month',
}

export const defaultDraft = (time = '08:00'): RuleDraft => ({
  kind: 'dailyAtTimes',
  times: [time],
  days: ['MO'],
  interval: 2,
  nth: 1,
  day: 'MO',
  dayOfMonth: 1,
})

export function specOfDraft(d: RuleDraft): RuleSpec {
  const times = d.times
  switch (d.kind) {
    case 'dailyAtTimes':
      return { kind: d.kind, times }
    case 'weeklyOnDays':
      return { kind: d.kind, days: d.days, times }
    case 'everyNDays':
      return { kind: d.kind, interval: d.interval, times }
    case 'everyNWeeksOnDays':
      return { kind: d.kind, interval: d.interval, days: d.days, times }
    case 'monthlyOnNthWeekday':
      return { kind: d.kind, nth: d.nth, day: d.day, times }
    case 'monthlyOnDayOfMonth':
      return { kind: d.kind, dayOfMonth: d.dayOfMonth, times }
  }
}

/** The RRULE for a draft, or the first reason it cannot be built. */
export function buildDraft(d: RuleDraft): { rrule: string; error: null } | { rrule: null; error: string } {
  const parsed = ruleSpecSchema.safeParse(specOfDraft(d))
  if (!parsed.success) {
    const issue = parsed.error.issues[0]
    const field = String(issue?.path[0] ?? '')
    const message = field === 'interval' ? 'Repeat every 1 to 365' : (issue?.message ?? 'Check the rule')
    return { rrule: null, error: message }
  }
  try {
    return { rrule: buildRule(parsed.data), error: null }
  } catch (error) {
    return { rrule: null, error: error instanceof Error ? error.message : String(error) }
  }
}

const sortedList = (text: string) => text.split(',').sort().join(',')
const canonical = (parts: ReadonlyMap<string, string>) =>
  [...parts]
    .map(([name, value]) => `${name}=${sortedList(value)}`)
    .sort()
    .join(';')

function timesOf(parts: ReadonlyMap<string, string>): string[] | undefined {
  const numbers = (name: string) =>
    (parts.get(name) ?? '')
      .split(',')
      .filter(Boolean)
      .map(Number)
      .sort((a, b) => a - b)
  if (!parts.has('BYHOUR') && !parts.has('BYMINUTE')) return undefined
  const pad = (n: number) => String(n).padStart(2, '0')
  const grid = numbers('BYHOUR').flatMap((h) => numbers('BYMINUTE').map((m) => `${pad(h)}:${pad(m)}`))
  const positions = numbers('BYSETPOS')
  return positions.length ? grid.filter((_, i) => positions.includes(i + 1)) : grid
}

function candidate(parts: ReadonlyMap<string, string>): RuleSpec | null {
  const times = timesOf(parts)
  const interval = Number(parts.get('INTERVAL') ?? 1)
  const byDay = parts.get('BYDAY')?.split(',') ?? []
  const byMonthDay = parts.get('BYMONTHDAY')
  switch (parts.get('FREQ')) {
    case 'DAILY':
      if (byDay.length || byMonthDay) return null
      return interval === 1 && times ? { kind: 'dailyAtTimes', times } : { kind: 'everyNDays', interval, times }
    case 'WEEKLY':
      if (!byDay.length) return null
      return interval === 1
        ? { kind: 'weeklyOnDays', days: byDay as Weekday[], times }
        : { kind: 'everyNWeeksOnDays', interval, days: byDay as Weekday[], times }
    case 'MONTHLY': {
      const nth = /^(-1|[1-4])(MO|TU|WE|TH|FR|SA|SU)$/.exec(byDay[0] ?? '')
      if (byDay.length === 1 && nth && !byMonthDay) return { kind: 'monthlyOnNthWeekday', nth: Number(nth[1]) as NthWeek, day: nth[2] as Weekday, times }
      if (!byDay.length && byMonthDay) return { kind: 'monthlyOnDayOfMonth', dayOfMonth: Number(byMonthDay), times }
      return null
    }
    default:
      return null
  }
}

/** The builder form of a stored rule, or null when only the written rule can express it. */
export function draftOfRule(rrule: string, startTime: string): RuleDraft | null {
  try {
    const parsed = parseRule(rrule)
    const spec = candidate(parsed.parts)
    if (!spec || canonical(parseRule(buildRule(spec)).parts) !== canonical(parsed.parts)) return null
    const draft = { ...defaultDraft(startTime), ...spec, times: spec.times ?? [startTime] } as RuleDraft
    // a plain FREQ=DAILY reads better as "every day at <start time>" than "every 1 days"
    return draft.kind === 'everyNDays' && draft.interval === 1 ? { ...draft, kind: 'dailyAtTimes', interval: 2 } : draft
  } catch {
    return null
  }
}
