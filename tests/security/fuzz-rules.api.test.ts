import fc from 'fast-check'
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { ensureFacilityAndParameters, makeAreaWithTanks, routineInput } from '#tests/support/facility-fixtures'
import { getFacility } from '#server/modules/facility/facility.service'
import { odditiesRule } from '#tests/support/fuzz-values'
import { checkRulesInChild, type RuleCheck } from '#tests/support/rule-check'
import { startTestApp, type TestApp } from '#tests/support/test-app'

const RUNS = Math.min(Number(process.env.ROUNDTIDE_FUZZ_RUNS ?? 500), 300)
// Bounded rule work takes tens to hundreds of milliseconds per rule; a rule whose expansion never
// ends takes for ever. The deadline is for the whole batch and generous for a loaded machine.
const BATCH_DEADLINE_MS = 90_000

let t: TestApp
let supervisor: request.Agent
let tankId: number
let checked: RuleCheck[] = []
beforeAll(async () => {
  t = await startTestApp()
  await ensureFacilityAndParameters()
  supervisor = (await t.signedInAgent('supervisor')).agent
  tankId = (await makeAreaWithTanks(1)).tanks[0].id
})
afterAll(() => t.close())

describe('fuzzing rules that never match or match too densely', () => {
  test(
    'every generated rule is answered (no expansion runs for ever), and a rule the check accepts really is plannable',
    { timeout: BATCH_DEADLINE_MS + 10_000 },
    async () => {
      const rules = fc.sample(odditiesRule, RUNS)
      // Judged where the server judges it: the routine's start in the facility's own zone.
      checked = await checkRulesInChild(rules, BATCH_DEADLINE_MS, {
        dtstart: routineInput({ rrule: 'FREQ=DAILY', targetIds: [tankId] }).dtstart,
        tzid: (await getFacility()).timeZone,
      })
      const slowest = checked.reduce((a, b) => (b.ms > a.ms ? b : a))
      console.log(
        `rule fuzz: ${checked.filter((c) => c.problem).length} of ${checked.length} refused; slowest check ${slowest.ms.toFixed(0)} ms (${slowest.rrule})`,
      )
      expect(checked.filter((c) => c.problem !== null && c.problem.length < 20)).toEqual([])
      expect(checked.filter((c) => c.plannable === false)).toEqual([])
    },
  )

  test('a routine with a generated rule is saved (201) or refused with a 400 on the rule, never 500', async () => {
    expect(checked.length).toBeGreaterThan(0)
    await fc.assert(
      fc.asyncProperty(fc.constantFrom(...checked), async ({ rrule, problem }) => {
        // Paused: the rule is checked as for any routine, without planning six weeks of tasks each time.
        const res = await supervisor.post('/api/routines').send({ ...routineInput({ rrule, targetIds: [tankId] }), paused: true })
        return problem === null ? res.status === 201 : res.status === 400 && res.body.error.fieldErrors.rrule?.[0] === problem
      }),
      { numRuns: Math.min(RUNS, 40) },
    )
  })
})
