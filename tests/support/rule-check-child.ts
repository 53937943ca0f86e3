// Runs the rule check on rules sent as JSON lines on stdin, one answer line each, so a test can
// give the whole batch a deadline: rule work is synchronous, and a rule that never ends would
// otherwise hang the test process itself instead of failing it.
import { createInterface } from 'node:readline'
import { expandRuleBounded } from '#shared/schedule/expand-rule'
import { plannableRuleProblem } from '#shared/schedule/plannable-rule'
import { RULE_LIMITS } from '#shared/schedule/rule-limits'

// The routine's start and the facility's zone, as the server will judge the rule (a rule with
// UNTIL can have dates in one zone and none in another).
const [dtstart, tzid] = [process.argv[2] ?? '2026-01-05T07:30:00', process.argv[3] ?? 'Europe/Oslo']

/** A rule the check accepts must really give a first date and stay under the density limit. */
function reallyPlannable(rrule: string) {
  const first = expandRuleBounded({ rrule, dtstart, tzid, limit: 1 }).occurrences[0]
  if (!first) return false
  const to = new Date(Date.parse(first.utc) + RULE_LIMITS.horizonDays * 86_400_000 - 1).toISOString()
  return expandRuleBounded({ rrule, dtstart, tzid, from: first.utc, to, limit: RULE_LIMITS.maxPerHorizon + 1 }).occurrences.length <= RULE_LIMITS.maxPerHorizon
}

for await (const line of createInterface({ input: process.stdin })) {
  const rrule = JSON.parse(line) as string
  process.stdout.write(`${JSON.stringify({ started: rrule })}\n`)
  const started = performance.now()
  const problem = plannableRuleProblem({ rrule, dtstart, tzid })
  const ms = performance.now() - started
  process.stdout.write(`${JSON.stringify({ rrule, ms, problem, plannable: problem === null ? reallyPlannable(rrule) : null })}\n`)
}
