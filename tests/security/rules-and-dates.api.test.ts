import { monitorEventLoopDelay } from 'node:perf_hooks'
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { db } from '#server/db/data-source'
import { RoutineEntity } from '#server/modules/routines/routine.entity'
import { TaskEntity } from '#server/modules/tasks/task.entity'
import { materialise } from '#server/modules/scheduling/materialiser'
import { ensureFacilityAndParameters, makeAreaWithTanks, routineInput, routineRow } from '#tests/support/facility-fixtures'
import { startTestApp, type TestApp } from '#tests/support/test-app'

let t: TestApp
let supervisor: request.Agent
let tankIds: number[]
beforeAll(async () => {
  t = await startTestApp()
  await ensureFacilityAndParameters()
  supervisor = (await t.signedInAgent('supervisor')).agent
  tankIds = (await makeAreaWithTanks(1)).tanks.map((tank) => tank.id)
})
afterAll(() => t.close())

// Each passes the RFC 5545 checks but has no date at all: BYSETPOS asks for a position its
// period never has, so an unbounded walk would run to the year 9999.
const NEVER_MATCHING = [
  'FREQ=HOURLY;BYSETPOS=2;BYMINUTE=0',
  'FREQ=DAILY;BYSETPOS=2;BYHOUR=1',
  'FREQ=MINUTELY;BYSETPOS=2;BYSECOND=0',
  'FREQ=SECONDLY;BYSETPOS=2;BYSECOND=0',
  'FREQ=WEEKLY;BYSETPOS=9;BYDAY=MO,TU',
  'FREQ=MONTHLY;BYSETPOS=40;BYDAY=MO,TU,WE,TH,FR,SA,SU',
]

describe('a rule with no dates is refused quickly, and the server keeps answering meanwhile', () => {
  test.each(NEVER_MATCHING)('%s answers 400 with a reason on the rule field', async (rrule) => {
    const res = await supervisor
      .post('/api/routines')
      .send(routineInput({ rrule, targetIds: tankIds }))
      .expect(400)
    expect(res.body.error.fieldErrors.rrule[0]).toMatch(/gives no date in the \d+ (years|days|hours) after its start/)
    expect(await db().getRepository(RoutineEntity).countBy({ rrule })).toBe(0)
  })

  test.each([
    ['FREQ=MINUTELY;INTERVAL=10;BYMINUTE=17', /never reaches its BYMINUTE/],
    ['FREQ=HOURLY;INTERVAL=2;BYHOUR=8,10', /never reaches its BYHOUR/],
    ['FREQ=SECONDLY;BYMINUTE=53;BYMONTHDAY=30', /cannot plan FREQ=SECONDLY with BYHOUR or BYMINUTE/],
  ])('%s, which rrule would step through for ever inside one call, is refused before it is expanded', async (rrule, reason) => {
    const res = await supervisor
      .post('/api/routines')
      .send(routineInput({ rrule, targetIds: tankIds }))
      .expect(400)
    expect(res.body.error.fieldErrors.rrule[0]).toMatch(reason)
  })

  test('a rule repeating every minute is refused: it would make tens of thousands of tasks', async () => {
    const res = await supervisor
      .post('/api/routines')
      .send(routineInput({ rrule: 'FREQ=MINUTELY', targetIds: tankIds }))
      .expect(400)
    expect(res.body.error.fieldErrors.rrule[0]).toMatch(/repeats too often/)
  })

  test('while the never-matching rules are checked, /api/health still answers promptly', async () => {
    // Warm the route and the rule code first, so the figure is the rule work and not first-call compilation.
    await supervisor
      .post('/api/routines')
      .send(routineInput({ rrule: NEVER_MATCHING[0], targetIds: tankIds }))
      .expect(400)
    const delay = monitorEventLoopDelay({ resolution: 5 })
    delay.enable()
    const health: number[] = []
    let checking = true
    const probe = (async () => {
      while (checking) {
        const started = performance.now()
        await request(t.app).get('/api/health').expect(200)
        health.push(performance.now() - started)
      }
    })()
    for (const rrule of NEVER_MATCHING) {
      await supervisor
        .post('/api/routines')
        .send(routineInput({ rrule, targetIds: tankIds }))
        .expect(400)
    }
    checking = false
    await probe
    delay.disable()
    const slowestHealthMs = Math.max(...health)
    const longestBlockMs = delay.max / 1e6
    console.log(
      `rule checks: ${health.length} health answers, slowest ${slowestHealthMs.toFixed(1)} ms; longest event-loop block ${longestBlockMs.toFixed(1)} ms`,
    )
    expect(health.length).toBeGreaterThan(0)
    // About 25 ms of rule work per check on an idle core (RULE_LIMITS.maxSteps); the bound is ten
    // times that, for a loaded shared machine. An unbounded walk to the year 9999 takes seconds.
    expect(slowestHealthMs).toBeLessThan(400)
    expect(longestBlockMs).toBeLessThan(400)
  })
})

describe('impossible calendar dates', () => {
  test.each([
    ['activeFrom', { activeFrom: '2026-02-30' }],
    ['activeTo', { activeTo: '2026-04-31' }],
    ['skipDates', { skipDates: ['2027-02-29'] }],
    ['dtstart', { dtstart: '2026-02-30T07:30:00' }],
    ['dtstart', { dtstart: '2026-03-01T24:00:00' }],
  ])('a routine with an impossible %s is refused with 400 and not stored', async (field, change) => {
    const input = routineInput({ targetIds: tankIds, ...change })
    const res = await supervisor.post('/api/routines').send(input).expect(400)
    expect(Object.keys(res.body.error.fieldErrors).join(' ')).toContain(field)
    expect(await db().getRepository(RoutineEntity).countBy({ name: input.name })).toBe(0)
  })

  test('a shift on 30 February is refused with 400, and a leap day is accepted', async () => {
    const person = await t.createPersonWithRole('technician')
    const shift = { personId: person.id, start: '07:00', end: '15:00', kind: 'day' }
    const res = await supervisor
      .post('/api/shifts')
      .send({ ...shift, date: '2026-02-30' })
      .expect(400)
    expect(res.body.error.fieldErrors.date).toEqual(['There is no such date'])
    await supervisor
      .post('/api/shifts')
      .send({ ...shift, date: '2028-02-29' })
      .expect(201)
  })

  test('a routine stored with an impossible date before the check is skipped and flagged; the routines after it are still planned', async () => {
    const repo = db().getRepository(RoutineEntity)
    const { body: good } = await supervisor
      .post('/api/routines')
      .send(routineInput({ targetIds: tankIds, rrule: 'FREQ=DAILY', dtstart: '2026-01-05T07:30:00' }))
      .expect(201)
    // As it could have been saved by the earlier schema, which checked only the shape.
    const bad = await repo.save(
      repo.create({
        ...routineInput({ targetIds: tankIds }),
        instructions: '',
        onlyInUse: true,
        durationMinutes: 5,
        windowBeforeMinutes: 30,
        graceMinutes: 60,
        priority: 'routine',
        assigneeRule: { kind: 'none' },
        activeFrom: '2026-02-30',
        activeTo: null,
        paused: false,
        skipDates: [],
        ladderId: null,
        planningError: null,
        requiredReadings: [],
        version: 1,
      }),
    )
    await db().getRepository(TaskEntity).delete({ routineId: good.id })

    const result = await materialise({ routineIds: [bad.id, good.id] })
    expect(result.routines).toBe(2)
    expect(await db().getRepository(TaskEntity).countBy({ routineId: good.id })).toBeGreaterThan(30)
    expect((await routineRow(bad.id)).planningError).toMatch(/2026-02-30 is not a calendar date/)
    expect((await routineRow(good.id)).planningError).toBeNull()
    const listed = (await supervisor.get('/api/routines').expect(200)).body as Array<{ id: number; planningError: string | null }>
    expect(listed.find((r) => r.id === bad.id)?.planningError).toMatch(/could not be planned/)
  })
})
