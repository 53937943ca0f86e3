import fixture from '../../../fixtures/rrule_rfc5545.json' with { type: 'json' }
import type { ExpandRuleInput, Occurrence } from '#shared/schedule/expand-rule'

/** One RFC 5545 §3.8.5.3 example, turned into expandRule's input. */
export type RfcExample = {
  title: string
  input: ExpandRuleInput
  /** true: the rule is bounded and `expected` is its whole set; false: `expected` is the prefix the RFC prints. */
  completeSet: boolean
  expectedCount: number
  expected: Occurrence[]
  needsExdate: boolean
}

const DTSTART_LINE = /^DTSTART;TZID=([^:]+):(\d{4})(\d{2})(\d{2})T(\d{2})(\d{2})(\d{2})$/

function toInput(dtstartLine: string, rrule: string): ExpandRuleInput {
  const match = DTSTART_LINE.exec(dtstartLine)
  if (!match) throw new Error(`Unexpected DTSTART line in fixture: ${dtstartLine}`)
  const [, tzid, year, month, day, hour, minute, second] = match
  return { rrule, tzid, dtstart: `${year}-${month}-${day}T${hour}:${minute}:${second}` }
}

export const rfcFixtureNote = fixture.note

export const rfcExamples: RfcExample[] = fixture.examples.map((example) => ({
  title: example.title,
  input: toInput(example.dtstart, example.rrule),
  completeSet: example.complete_set,
  expectedCount: example.expected_count,
  expected: example.expected_occurrences.map(({ local, utc }) => ({ local, utc })),
  needsExdate: example.exdate !== null,
}))

/** Input for expanding the example to the length the RFC prints (the whole set when bounded). */
export function inputForPrintedList(example: RfcExample): ExpandRuleInput {
  return example.completeSet ? example.input : { ...example.input, limit: example.expected.length }
}
