import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { DateTime } from 'luxon'
import type request from 'supertest'
import { db } from '#server/db/data-source'
import { advanceTaskStatuses } from '#server/jobs/status-clock'
import { AlertEntity } from '#server/modules/completions/completion.entities'
import { batches } from '#server/modules/facility/catalogues'
import { createPlaybook } from '#server/modules/playbooks/playbooks.service'
import { TaskEntity } from '#server/modules/tasks/task.entity'
import { DEMO_PLAYBOOKS } from '#seed/demo-playbooks'
import { PlaybookInputSchema } from '#shared/schemas/playbook'
import { ensureFacilityAndParameters, makeAreaWithTanks, uniqueCode } from '#tests/support/facility-fixtures'
import { makeTankTask } from '#tests/support/task-fixtures'
import { startTestApp, type TestApp } from '#tests/support/test-app'

let t: TestApp
let supervisor: request.Agent
let zone: string
const playbookIds: Record<string, number> = {}
beforeAll(async () => {
  t = await startTestApp()
  zone = (await ensureFacilityAndParameters()).timeZone
  supervisor = (await t.signedInAgent('supervisor')).agent
  for (const p of DEMO_PLAYBOOKS) playbookIds[p.kind] = (await createPlaybook(PlaybookInputSchema.parse({ ...p, name: `${p.name} ${uniqueCode('pb')}` }))).id
})
afterAll(() => t.close())

const eventTasks = (eventId: number) =>
  db()
    .getRepository(TaskEntity)
    .find({ where: { eventId }, order: { dueAt: 'ASC' } })

describe('arrival event', () => {
  test('starting an arrival creates its tasks at the right offsets in facility time', async () => {
    const { tanks } = await makeAreaWithTanks(2)
    const start = DateTime.now().setZone(zone).plus({ days: 40 }).set({ hour: 9, minute: 30, second: 0, millisecond: 0 })
    const { body: event } = await supervisor
      .post('/api/events')
      .send({ playbookId: playbookIds.arrival, title: 'Juveniles in', localStart: start.toFormat("yyyy-MM-dd'T'HH:mm"), tankIds: tanks.map((x) => x.id) })
      .expect(201)
    const rows = await eventTasks(event.id)
    const at = (title: string) => rows.filter((r) => r.title.startsWith(title)).map((r) => r.localStart)
    const dayBefore = start.minus({ days: 1 }).toISODate()
    expect(at('Prepare and test receiving bins')).toEqual([`${dayBefore}T14:00:00`, `${dayBefore}T14:00:00`]) // −1 day 14:00, per bin
    expect(at('Receive consignment')).toEqual([start.toFormat("yyyy-MM-dd'T'HH:mm:ss")]) // 0 h, once
    expect(at('Transport-water test')).toEqual([start.plus({ minutes: 10 }).toFormat("yyyy-MM-dd'T'HH:mm:ss")]) // +10 min
    expect(at('First-feed response check')).toEqual(Array(2).fill(`${start.plus({ days: 1 }).toISODate()}T10:30:00`)) // +1 day, per bin
    const daily = at('Daily quarantine check')
    expect(daily).toHaveLength(60) // daily for 30 days × 2 bins
    expect(daily[0]).toBe(`${start.plus({ days: 1 }).toISODate()}T09:45:00`)
    expect(daily.at(-1)).toBe(`${start.plus({ days: 30 }).toISODate()}T09:45:00`)
    expect(event).toMatchObject({ kind: 'arrival', fastingFrom: null, taskCount: rows.length })
  })

  test('cancelling removes the untouched tasks and keeps one already done', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const start = DateTime.now().setZone(zone).plus({ days: 45 }).set({ hour: 9, minute: 0, second: 0, millisecond: 0 })
    const { body: event } = await supervisor
      .post('/api/events')
      .send({ playbookId: playbookIds.arrival, title: 'Cancelled intake', localStart: start.toFormat("yyyy-MM-dd'T'HH:mm"), tankIds: [tanks[0].id] })
      .expect(201)
    const [first] = await eventTasks(event.id)
    await db().getRepository(TaskEntity).update(first.id, { status: 'done', completedAt: new Date() })
    const { body: cancelled } = await supervisor.post(`/api/events/${event.id}/cancel`).expect(200)
    expect(cancelled.status).toBe('cancelled')
    const left = await eventTasks(event.id)
    expect(left.map((x) => x.id)).toEqual([first.id])
  })

  test('moving the event moves its untouched tasks', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const start = DateTime.now().setZone(zone).plus({ days: 50 }).set({ hour: 9, minute: 0, second: 0, millisecond: 0 })
    const { body: event } = await supervisor
      .post('/api/events')
      .send({ playbookId: playbookIds.treatment, title: 'Bath', localStart: start.toFormat("yyyy-MM-dd'T'HH:mm"), tankIds: [tanks[0].id] })
      .expect(201)
    const later = start.plus({ days: 2 })
    await supervisor
      .patch(`/api/events/${event.id}`)
      .send({ localStart: later.toFormat("yyyy-MM-dd'T'HH:mm") })
      .expect(200)
    const rows = await eventTasks(event.id)
    expect(rows.find((r) => r.title.startsWith('Bath: watch'))!.localStart).toBe(later.toFormat("yyyy-MM-dd'T'HH:mm:ss"))
    expect(rows).toHaveLength(4)
  })
})

describe('fasting window', () => {
  test('a dispatch holds the feeds in the 24 h before it, they are never missed or escalated, and ending it releases those still ahead', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const now = Date.now()
    const hour = 3_600_000
    const feed = (offsetHours: number) =>
      makeTankTask(tanks[0], {
        category: 'feeding',
        title: 'Feed',
        priority: 'routine',
        requiredReadings: ['feed_g'],
        status: 'planned',
        dueAt: new Date(now + offsetHours * hour),
        windowStartAt: new Date(now + (offsetHours - 0.5) * hour),
        graceUntil: new Date(now + (offsetHours + 1) * hour),
      })
    const [past, soon, later, outside] = [await feed(-3), await feed(5), await feed(10), await feed(30)]
    const dispatchAt = DateTime.fromMillis(now + 20 * hour).setZone(zone)
    const { body: event } = await supervisor
      .post('/api/events')
      .send({ playbookId: playbookIds.dispatch, title: 'Dispatch to grow-out', localStart: dispatchAt.toFormat("yyyy-MM-dd'T'HH:mm"), tankIds: [tanks[0].id] })
      .expect(201)
    expect(event.fastingFrom).toBeTruthy()
    const status = async (id: number) => await db().getRepository(TaskEntity).findOneByOrFail({ id })
    expect((await status(past.id)).status).toBe('held')
    expect(await status(soon.id)).toMatchObject({ status: 'held', heldReason: 'Fasting before Dispatch to grow-out' })
    expect((await status(later.id)).status).toBe('held')
    expect((await status(outside.id)).status).toBe('planned')
    await advanceTaskStatuses(db(), new Date(now + 48 * hour))
    expect((await status(past.id)).status).toBe('held')
    expect(await db().getRepository(AlertEntity).countBy({ taskId: past.id })).toBe(0)
    await db().getRepository(TaskEntity).update(outside.id, { status: 'planned' })
    await supervisor.post(`/api/events/${event.id}/end`).expect(200)
    expect((await status(past.id)).status).toBe('held')
    expect((await status(soon.id)).status).toBe('planned')
    expect((await status(later.id)).status).toBe('planned')
  })

  test('a technician cannot complete a held feed', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const task = await makeTankTask(tanks[0], { category: 'feeding', status: 'held', heldReason: 'Fasting before transfer' })
    const { agent } = await t.signedInAgent('technician')
    const res = await agent
      .post(`/api/tasks/${task.id}/completion`)
      .send({ completionId: crypto.randomUUID(), readings: { do_mgL: 6, temp_c: 28 } })
      .expect(403)
    expect(res.body.error.message).toMatch(/on hold/)
  })
})

describe('batch record and oxygen supply', () => {
  test('a weighing of 25 fish is stored with its statistics and updates the batch mean weight', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const batch = await batches.create({
      code: uniqueCode('B'),
      species: 'Barramundi',
      origin: 'Invented hatchery',
      arrivalDate: '2026-11-01',
      count: 400,
      meanWeightG: 2,
      tankIds: [tanks[0].id],
      status: 'quarantine',
      feedRatePct: 3,
    })
    const weights = [2.1, 2.4, 1.9, 2.2, 2.8, 2.0, 2.3, 2.5, 1.8, 2.6, 2.2, 2.1, 2.4, 2.0, 2.7, 2.3, 1.9, 2.2, 2.5, 2.1, 2.6, 2.0, 2.3, 2.4, 2.2]
    const { agent } = await t.signedInAgent('technician')
    const { body } = await agent.post(`/api/batches/${batch.id}/records`).send({ kind: 'weighing', weightsG: weights }).expect(201)
    // Reference values computed by hand: sum 56.5 g over 25 fish.
    expect(body.data.n).toBe(25)
    expect(body.data.mean).toBeCloseTo(2.26, 10)
    const after = await batches.get(batch.id)
    expect(after.meanWeightG).toBe(2.26)
    const box = await agent
      .post(`/api/batches/${batch.id}/records`)
      .send({ kind: 'transport_box', box: 'Box 1', doMgL: 8, tempC: 24.5, pH: 7.2, receivingTempC: 28, receivingPH: 7.9 })
      .expect(201)
    expect(box.body.data.warnings).toHaveLength(2)
  })

  test('a cylinder reading that leaves less than the minimum hours raises a replace task; a critical one starts the ladder', async () => {
    const code = uniqueCode('O2')
    const { body: cyl } = await supervisor
      .post('/api/oxygen/cylinders')
      .send({ code, label: 'Test bank', method: 'metric', waterCapacityL: 50, reservePressure: 20, flowLPerMin: 5 })
      .expect(201)
    const { body: fine } = await supervisor.post(`/api/oxygen/cylinders/${cyl.id}/readings`).send({ pressure: 200, flowLPerMin: 5 }).expect(200)
    expect(fine.level).toBe('ok')
    expect(fine.replaceTaskId).toBeNull()
    // 50 L × (25 − 20) bar ≈ 250 L above reserve at 5 L/min ≈ 0.8 h (ideal gas): critical.
    const { body: low } = await supervisor.post(`/api/oxygen/cylinders/${cyl.id}/readings`).send({ pressure: 25, flowLPerMin: 5 }).expect(200)
    expect(low.level).toBe('critical')
    expect(low.hoursToReserve).toBeCloseTo(0.8, 1)
    const task = await db().getRepository(TaskEntity).findOneByOrFail({ id: low.replaceTaskId })
    expect(task).toMatchObject({ title: `Replace oxygen cylinder ${code}`, status: 'open', priority: 'welfare_critical' })
    expect(await db().getRepository(AlertEntity).countBy({ taskId: task.id, kind: 'critical_reading' })).toBe(1)
    await supervisor.post(`/api/oxygen/cylinders/${cyl.id}/readings`).send({ pressure: -4, flowLPerMin: 5 }).expect(400)
  })
})
