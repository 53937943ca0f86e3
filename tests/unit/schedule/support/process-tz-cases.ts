import { expandRule } from '#shared/schedule/expand-rule'
import type { ExpandRuleInput, Occurrence } from '#shared/schedule/expand-rule'
import { dstScenarios } from './dst-scenarios'
import { inputForPrintedList, rfcExamples } from './rfc5545-examples'

// Inputs whose results must not depend on the process TZ: every RFC example, every DST
// scenario, and bounds (UNTIL in UTC and local form, from/to with and without an offset).
const boundedInputs: ExpandRuleInput[] = [
  { rrule: 'FREQ=DAILY;UNTIL=20250330T060000Z', dtstart: '2025-03-28T07:30:00', tzid: 'Europe/Berlin' },
  { rrule: 'FREQ=DAILY;UNTIL=20251005T073000', dtstart: '2025-10-03T07:30:00', tzid: 'Australia/Sydney' },
  { rrule: 'FREQ=WEEKLY;BYDAY=MO,TH', dtstart: '2025-01-02T18:00:00', tzid: 'Asia/Kolkata', from: '2025-02-01T00:00:00Z', to: '2025-02-20T00:00:00Z' },
  { rrule: 'FREQ=DAILY', dtstart: '2025-03-01T00:15:00', tzid: 'Pacific/Chatham', from: '2025-04-05T00:00:00', to: '2025-04-08T00:00:00' },
]

export function expandAllCases(): Record<string, Occurrence[]> {
  const inputs: [string, ExpandRuleInput][] = [
    ...rfcExamples.map((example): [string, ExpandRuleInput] => [`RFC: ${example.title}`, inputForPrintedList(example)]),
    ...dstScenarios.map((scenario): [string, ExpandRuleInput] => [scenario.story, scenario.input]),
    ...boundedInputs.map((input): [string, ExpandRuleInput] => [JSON.stringify(input), input]),
  ]
  return Object.fromEntries(inputs.map(([name, input]) => [name, expandRule(input)]))
}
