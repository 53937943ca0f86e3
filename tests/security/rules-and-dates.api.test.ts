import { monitorEventLoopDelay } from 'node:perf_hooks'
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { db } from '#server/db/data-source'
import { RoutineEntity } from '#server/modules/routines/routine.entity'
import { TaskEntity } from '#server/modules/tasks/task.entity'
import { materialise } from '#server/modules/scheduling/materialiser'
import { ensureFacilityAndParameters, makeAreaWithTanks, routineInput, routineRow } from '#tests/support/facility-fixtures'
import { startTestApp, type TestApp } from '#tests/support/test-app'
import { ALL_WORST_RULES, WORST_RULES } from '#tests/support/worst-rules'

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
const NEVER_MATCHING = WORST_RULES.neverMatching.filter((rrule) => !rrule.startsWith('FREQ=SECONDLY'))
// Allowed, and planned at once: six weeks of a task every 15 minutes, and rules whose first date is a leap day.
const ACCEPTED: readonly string[] = [...WORST_RULES.atTheLimit, 'FREQ=HOURLY;BYMONTH=2;BYMONTHDAY=29', 'FREQ=MINUTELY;INTERVAL=15;BYMONTH=2;BYMONTHDAY=29']

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
    ['FREQ=MINUTELY;BYHOUR=5;BYMONTHDAY=30', /cannot plan FREQ=MINUTELY with BYHOUR/],
  ])('%s, which rrule would step through for ever inside one call, is refused before it is expanded', async (rrule, reason) => {
    const res = await supervisor
      .post('/api/routines')
      .send(routineInput({ rrule, targetIds: tankIds }))
      .expect(400)
    expect(res.body.error.fieldErrors.rrule[0]).toMatch(reason)
  })

  test.each(['FREQ=SECONDLY', 'FREQ=SECONDLY;BYSETPOS=2;BYSECOND=0'])('%s is refused outright: nobody does a care task every few seconds', async (rrule) => {
    const res = await supervisor
      .post('/api/routines')
      .send(routineInput({ rrule, targetIds: tankIds }))
      .expect(400)
    expect(res.body.error.fieldErrors.rrule[0]).toMatch(/plans tasks to the minute: FREQ=SECONDLY is not used for routines/)
  })

  test('a rule repeating every minute is refused: it would make tens of thousands of tasks', async () => {
    const res = await supervisor
      .post('/api/routines')
      .send(routineInput({ rrule: 'FREQ=MINUTELY', targetIds: tankIds }))
      .expect(400)
    expect(res.body.error.fieldErrors.rrule[0]).toMatch(/repeats too often/)
  })

  test('while the worst rules of every class are checked (and the allowed ones planned), /api/health still answers promptly', async () => {
    // Warm the route and the rule code first, so the figure is the rule work and not first-call compilation.
    await supervisor
      .post('/api/routines')
      .send(routineInput({ rrule: NEVER_MATCHING[0], targetIds: tankIds }))
      .expect(400)
    const delay = monitorEventLoopDelay({ resolution: 5 })
    delay.enable()
    const health: number[] = []
    const answers: Array<{ rrule: string; ms: number }> = []
    let checking = true
    const probe = (async () => {
      while (checking) {
        const started = performance.now()
        await request(t.app).get('/api/health').expect(200)
        health.push(performance.now() - started)
      }
    })()
    for (const rrule of ALL_WORST_RULES) {
      const started = performance.now()
      const res = await supervisor.post('/api/routines').send(routineInput({ rrule, targetIds: tankIds }))
      answers.push({ rrule, ms: performance.now() - started })
      const lateFirst = WORST_RULES.lateFirstDate.some((r) => r === rrule)
      expect(res.status, rrule).toBe(ACCEPTED.includes(rrule) ? 201 : lateFirst ? res.status : 400)
      expect([201, 400], rrule).toContain(res.status)
    }
    checking = false
    await probe
    delay.disable()
    const slowestHealthMs = Math.max(...health)
    const longestBlockMs = delay.max / 1e6
    const slowestAnswer = answers.reduce((a, b) => (b.ms > a.ms ? b : a))
    console.log(
      `rule checks over ${ALL_WORST_RULES.length} worst rules: ${health.length} health answers, slowest ${slowestHealthMs.toFixed(1)} ms; ` +
        `longest event-loop block ${longestBlockMs.toFixed(1)} ms (goal 50 ms idle, measured in \`npm run bench\` 9); ` +
        `slowest routine answer ${slowestAnswer.ms.toFixed(0)} ms (${slowestAnswer.rrule.slice(0, 50)})`,
    )
    expect(health.length).toBeGreaterThan(0)
    // A check is at most RULE_LIMITS.maxSteps of rrule's work and about 4,100 dates placed
    // (tests/unit/schedule/rule-check-work.test.ts counts it), 20–30 ms of CPU; planning pauses
    // between week slices. The bound is loose, for a shared machine at a load of 15–20 where this
    // measured up to 0.8 s (record 12d): an unbounded walk takes seconds to minutes.
    expect(slowestHealthMs).toBeLessThan(1500)
    expect(longestBlockMs).toBeLessThan(1500)
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
