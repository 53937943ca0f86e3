import { DateTime } from 'luxon'
import { describeRule, validateRule } from '#shared/schedule/describe-rule'
import { expandRule } from '#shared/schedule/expand-rule'
import { parseRule } from '#shared/schedule/parse-rule'
import { plannableRuleProblem } from '#shared/schedule/plannable-rule'

const TIMED_FREQUENCIES = ['YEARLY', 'MONTHLY', 'WEEKLY', 'DAILY']

/**
 * describeRule in a sentence, adding the time of day from the start when the rule itself has
 * none (the stored rule "FREQ=DAILY" with a 07:30 start reads "Every day at 07:30").
 */
export function summariseRule(rrule: string, dtstart: string): string {
  const text = describeRule(rrule)
  const startTime = /T(\d{2}:\d{2})/.exec(dtstart)?.[1]
  if (!startTime || !takesTimeFromStart(rrule, text)) return sentence(text)
  // rrule's text puts "for N times" / "until ..." last; the time reads best before it
  const ending = / (?:for \d+ times?|until .+)$/.exec(text)?.[0] ?? ''
  return sentence(`${text.slice(0, text.length - ending.length)} at ${startTime}${ending}`)
}

function takesTimeFromStart(rrule: string, text: string): boolean {
  try {
    const rule = parseRule(rrule)
    // describeRule hands back the rule itself when it cannot word it faithfully
    return text !== rule.value && !rule.parts.has('BYHOUR') && TIMED_FREQUENCIES.includes(rule.parts.get('FREQ') ?? '')
  } catch {
    return false
  }
}

const sentence = (text: string) => text.charAt(0).toUpperCase() + text.slice(1)

export type PreviewRow = {
  local: string
  utc: string
  /** Minutes east of UTC at this occurrence. */
  offsetMinutes: number
  offsetChanged: boolean
  skipped: boolean
}

export type PreviewInput = {
  rrule: string
  dtstart: string
  timeZone: string
  now: Date
  activeFrom?: string | null
  activeTo?: string | null
  skipDates?: readonly string[]
  limit?: number
}

/** The next occurrences as the server will place them, or a readable reason there are none. */
export function previewRule(input: PreviewInput): { rows: PreviewRow[]; error: null } | { rows: null; error: string } {
  if (!/^\d{4}-\d{2}-\d{2}T/.test(input.dtstart)) return { rows: null, error: validateRule(input.rrule) ?? 'Choose a start date.' }
  const ruleError = plannableRuleProblem({ rrule: input.rrule, dtstart: input.dtstart, tzid: input.timeZone })
  if (ruleError) return { rows: null, error: ruleError }
  try {
    const activeStart = input.activeFrom ? DateTime.fromISO(input.activeFrom, { zone: input.timeZone }).toMillis() : NaN
    const from = new Date(activeStart > input.now.getTime() ? activeStart : input.now.getTime()).toISOString()
    const occurrences = expandRule({
      rrule: input.rrule,
      dtstart: input.dtstart,
      tzid: input.timeZone,
      from,
      to: input.activeTo ? `${input.activeTo}T23:59:59` : undefined,
      limit: input.limit ?? 10,
    })
    const skip = new Set(input.skipDates ?? [])
    let previousOffset: number | null = null
    const rows = occurrences.map((o) => {
      const offsetMinutes = Math.round((Date.parse(`${o.local}Z`) - Date.parse(o.utc)) / 60_000)
      const offsetChanged = previousOffset !== null && previousOffset !== offsetMinutes
      previousOffset = offsetMinutes
      return { ...o, offsetMinutes, offsetChanged, skipped: skip.has(o.local.slice(0, 10)) }
    })
    return { rows, error: null }
  } catch (error) {
    return { rows: null, error: error instanceof Error ? error.message : String(error) }
  }
}

export function formatOffset(minutes: number): string {
  if (minutes === 0) return 'UTC'
  const sign = minutes > 0 ? '+' : '−'
  const abs = Math.abs(minutes)
  return `UTC${sign}${String(Math.floor(abs / 60)).padStart(2, '0')}:${String(abs % 60).padStart(2, '0')}`
}
