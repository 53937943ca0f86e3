import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { DateTime } from 'luxon'
import type request from 'supertest'
import { db } from '#server/db/data-source'
import { applyAssigneeRules } from '#server/modules/roster/assignee-rules.service'
import { OnCallEntity } from '#server/modules/roster/roster.entities'
import { createShift } from '#server/modules/roster/roster.service'
import { createRoutine, updateRoutine } from '#server/modules/routines/routines.service'
import { TaskEntity } from '#server/modules/tasks/task.entity'
import { BoardWireSchema, unfoldBoard, wireCards } from '#shared/schemas/board'
import { ensureFacilityAndParameters, makeAreaWithTanks, routineData } from '#tests/support/facility-fixtures'
import { makeTankTask } from '#tests/support/task-fixtures'
import { startTestApp, type TestApp } from '#tests/support/test-app'

let t: TestApp
let supervisor: request.Agent
let zone: string
beforeAll(async () => {
  t = await startTestApp()
  zone = (await ensureFacilityAndParameters()).timeZone
  supervisor = (await t.signedInAgent('supervisor')).agent
})
afterAll(() => t.close())

const inDays = (n: number) => DateTime.now().setZone(zone).plus({ days: n }).toISODate()!
const taskRow = (id: number) => db().getRepository(TaskEntity).findOneByOrFail({ id })

async function technicianOnShift(date: string) {
  const person = await t.createPersonWithRole('technician')
  await createShift({ personId: person.id, date, start: '06:00', end: '18:00', kind: 'day' })
  return person
}

describe('the day as the board receives it', () => {
  test('each card names its kind and target once for the day, and unfolds into what the task itself says', async () => {
    const { area, tanks } = await makeAreaWithTanks(2)
    const date = inDays(9)
    const tech = await technicianOnShift(date)
    const made = await Promise.all([
      makeTankTask(tanks[0], { localDate: date, localStart: `${date}T07:30:00`, assigneeId: tech.id }),
      makeTankTask(tanks[1], { localDate: date, localStart: `${date}T07:45:00`, flag: 'watch' }),
      makeTankTask(tanks[0], { localDate: date, localStart: `${date}T08:00:00`, status: 'held', heldReason: 'Fasting before grading' }),
      // A whole area's check: its label comes from the catalogue, not the tank.
      makeTankTask(tanks[1], { localDate: date, localStart: `${date}T09:00:00`, targetKind: 'area', targetId: area.id, tankId: null }),
    ])
    const { body } = await supervisor.get(`/api/tasks/board?date=${date}`).expect(200)
    const wire = BoardWireSchema.parse(body)
    const ours = wireCards(wire.cards).filter((c) => made.some((m) => m.id === c.id))
    expect(ours).toHaveLength(4)
    // Four cards of one routine-like kind on two tanks and an area: the kind once, each target once.
    expect(new Set(ours.map((c) => c.kind)).size).toBe(1)
    expect(new Set(ours.map((c) => c.target)).size).toBe(3)
    expect(ours.find((c) => c.id === made[0].id)).not.toHaveProperty('flag')
    const board = unfoldBoard(wire)
    for (const m of made) {
      const { body: task } = await supervisor.get(`/api/tasks/${m.id}`).expect(200)
      const card = board.tasks.find((c) => c.id === m.id)!
      const {
        id,
        title,
        category,
        priority,
        durationMinutes,
        targetLabel,
        tankId,
        areaId,
        localDate,
        localTime,
        status,
        assigneeId,
        assigneeName,
        flag,
        heldReason,
        version,
      } = task
      expect(card).toEqual({
        id,
        title,
        category,
        priority,
        durationMinutes,
        targetLabel,
        tankId,
        areaId,
        localDate,
        localTime,
        status,
        assigneeId,
        assigneeName,
        flag,
        heldReason,
        version,
      })
    }
    expect(board.people.find((p) => p.personId === tech.id)).toMatchObject({ name: tech.name, taskCount: 1, plannedMinutes: 3 })
  })

  test('a browser that accepts brotli gets the day compressed, and it unpacks to the same day', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const date = inDays(11)
    // Enough cards to pass the 1 kB below which nothing is compressed.
    const times = Array.from({ length: 96 }, (_, q) => `${String(Math.floor(q / 4)).padStart(2, '0')}:${String((q % 4) * 15).padStart(2, '0')}`)
    await Promise.all(times.map((t) => makeTankTask(tanks[0], { localDate: date, localStart: `${date}T${t}:00` })))
    const plain = await supervisor.get(`/api/tasks/board?date=${date}`).set('accept-encoding', 'identity').expect(200)
    const packed = await supervisor
      .get(`/api/tasks/board?date=${date}`)
      .set('accept-encoding', 'br')
      .buffer(true)
      .parse((res, done) => {
        const chunks: Buffer[] = []
        res.on('data', (c: Buffer) => chunks.push(c))
        res.on('end', () => done(null, Buffer.concat(chunks)))
      })
      .expect(200)
    expect(plain.headers['content-encoding']).toBeUndefined()
    expect(packed.headers['content-encoding']).toBe('br')
    // supertest unpacks what the header names, so a wrong header or a corrupt stream fails here.
    expect(JSON.parse((packed.body as Buffer).toString('utf8'))).toEqual(plain.body)
  })
})

describe('assigning on the board', () => {
  test('when a supervisor assigns a card to a technician on shift, then it is theirs; unassigning puts it back', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const date = inDays(2)
    const task = await makeTankTask(tanks[0], { localDate: date })
    const tech = await technicianOnShift(date)
    const { body: assigned } = await supervisor.patch(`/api/tasks/${task.id}`).send({ assigneeId: tech.id, version: task.version }).expect(200)
    expect(assigned).toMatchObject({ assigneeId: tech.id, assigneeName: tech.name })
    const { body: board } = await supervisor.get(`/api/tasks/board?date=${date}`).expect(200)
    expect(board.people.find((p: { personId: number }) => p.personId === tech.id)).toMatchObject({ taskCount: 1, plannedMinutes: 3 })
    const { body: back } = await supervisor.patch(`/api/tasks/${task.id}`).send({ assigneeId: null, version: assigned.version }).expect(200)
    expect(back.assigneeId).toBeNull()
  })

  test('when the version is stale, then it answers 409 and nothing changes', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const date = inDays(2)
    const task = await makeTankTask(tanks[0], { localDate: date })
    const tech = await technicianOnShift(date)
    await supervisor
      .patch(`/api/tasks/${task.id}`)
      .send({ assigneeId: tech.id, version: task.version + 3 })
      .expect(409)
    expect((await taskRow(task.id)).assigneeId).toBeNull()
  })

  test('when the person is not on shift that day, then the move is refused with the reason', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const task = await makeTankTask(tanks[0], { localDate: inDays(3) })
    const offShift = await t.createPersonWithRole('technician')
    const res = await supervisor.patch(`/api/tasks/${task.id}`).send({ assigneeId: offShift.id, version: task.version }).expect(409)
    expect(res.body.error.message).toMatch(/not on shift/)
  })

  test('when a technician tries to assign, then it is refused', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const task = await makeTankTask(tanks[0], { localDate: inDays(2) })
    const { agent, person } = await t.signedInAgent('technician')
    await agent.patch(`/api/tasks/${task.id}`).send({ assigneeId: person.id, version: task.version }).expect(403)
  })

  test('when several cards are dragged together, then each is assigned and a stale one is refused alone', async () => {
    const { tanks } = await makeAreaWithTanks(3)
    const date = inDays(4)
    const tasks = await Promise.all(tanks.map((tank) => makeTankTask(tank, { localDate: date })))
    const tech = await technicianOnShift(date)
    const res = await supervisor
      .post('/api/tasks/bulk-move')
      .send({ assigneeId: tech.id, tasks: [...tasks.slice(0, 2).map((x) => ({ id: x.id, version: x.version })), { id: tasks[2].id, version: 99 }] })
      .expect(200)
    expect(res.body.moved).toHaveLength(2)
    expect(res.body.refused).toEqual([{ id: tasks[2].id, message: expect.stringMatching(/changed/) }])
  })
})

describe('moving to another day', () => {
  test('a weekly routine task moves to the next day, keeps its time, and is not recreated on its old day', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const routine = await createRoutine(routineData({ rrule: 'FREQ=WEEKLY', dtstart: `${inDays(2)}T10:15:00`, targetIds: [tanks[0].id] }))
    const [first] = await db()
      .getRepository(TaskEntity)
      .find({ where: { routineId: routine.id }, order: { dueAt: 'ASC' } })
    const target = DateTime.fromISO(first.localDate).plus({ days: 1 }).toISODate()!
    const { body } = await supervisor.patch(`/api/tasks/${first.id}`).send({ date: target, version: first.version }).expect(200)
    expect(body).toMatchObject({ localDate: target, localTime: '10:15' })
    await updateRoutine(routine.id, {
      ...routineData({ name: routine.name, rrule: 'FREQ=WEEKLY', dtstart: `${inDays(2)}T10:15:00`, targetIds: [tanks[0].id], instructions: 'edited' }),
      version: routine.version,
    })
    const all = await db()
      .getRepository(TaskEntity)
      .find({ where: { routineId: routine.id } })
    expect(all.filter((x) => x.localDate === first.localDate)).toHaveLength(0)
    expect(all.filter((x) => x.localDate === target)).toHaveLength(1)
  })

  test('a daily routine task cannot move onto the next occurrence, and the refusal says why', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const routine = await createRoutine(routineData({ rrule: 'FREQ=DAILY', dtstart: `${inDays(2)}T10:15:00`, targetIds: [tanks[0].id] }))
    const [first] = await db()
      .getRepository(TaskEntity)
      .find({ where: { routineId: routine.id }, order: { dueAt: 'ASC' } })
    const res = await supervisor
      .patch(`/api/tasks/${first.id}`)
      .send({ date: DateTime.fromISO(first.localDate).plus({ days: 1 }).toISODate(), version: first.version })
      .expect(409)
    expect(res.body.error.message).toMatch(/already has this task on/)
    await supervisor.patch(`/api/tasks/${first.id}`).send({ date: '2020-01-01', version: first.version }).expect(409)
  })
})

describe('assignee rules', () => {
  test('a "technician on shift" rule assigns to whoever is rostered, and a manual assignment survives re-materialisation', async () => {
    const { tanks } = await makeAreaWithTanks(2)
    const date = inDays(5)
    const tech = await technicianOnShift(date)
    const routine = await createRoutine(
      routineData({
        rrule: 'FREQ=DAILY',
        dtstart: `${inDays(1)}T07:30:00`,
        targetIds: tanks.map((x) => x.id),
        assigneeRule: { kind: 'role_on_shift', role: 'technician' },
      }),
    )
    await applyAssigneeRules(date, date)
    const onDay = await db()
      .getRepository(TaskEntity)
      .find({ where: { routineId: routine.id, localDate: date } })
    // Other tests roster technicians too; ours must be among the assignees and nobody off shift.
    expect(onDay.every((x) => x.assigneeId !== null)).toBe(true)
    const other = await technicianOnShift(date)
    await supervisor
      .patch(`/api/tasks/${onDay[0].id}`)
      .send({ assigneeId: other.id, version: (await taskRow(onDay[0].id)).version })
      .expect(200)
    await updateRoutine(routine.id, {
      ...routineData({
        name: routine.name,
        rrule: 'FREQ=DAILY',
        dtstart: `${inDays(1)}T07:30:00`,
        targetIds: tanks.map((x) => x.id),
        assigneeRule: { kind: 'role_on_shift', role: 'technician' },
        instructions: 'changed',
      }),
      version: routine.version,
    })
    await applyAssigneeRules(date, date)
    expect((await taskRow(onDay[0].id)).assigneeId).toBe(other.id)
    expect(tech.id).toBeGreaterThan(0)
  })

  test('a named-person rule assigns that person on materialisation', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const person = await t.createPersonWithRole('supervisor')
    const routine = await createRoutine(routineData({ targetIds: [tanks[0].id], assigneeRule: { kind: 'person', personId: person.id } }))
    const rows = await db()
      .getRepository(TaskEntity)
      .find({ where: { routineId: routine.id } })
    expect(rows.length).toBeGreaterThan(0)
    expect(rows.every((x) => x.assigneeId === person.id)).toBe(true)
  })
})

describe('roster API', () => {
  test('a weekly pattern makes shifts; the rotation shares weekends and shows each count; calendar shows duty', async () => {
    const a = await t.createPersonWithRole('technician', { onCallEligible: true })
    const b = await t.createPersonWithRole('technician', { onCallEligible: true })
    const monday = DateTime.now().setZone(zone).plus({ weeks: 20 }).startOf('week').toISODate()!
    const pattern = await supervisor
      .post('/api/shifts/pattern')
      .send({
        personId: a.id,
        weekdays: ['MO', 'WE'],
        start: '07:00',
        end: '15:00',
        kind: 'day',
        from: monday,
        to: DateTime.fromISO(monday).plus({ days: 13 }).toISODate(),
      })
      .expect(201)
    expect(pattern.body).toEqual({ created: 4, skipped: 0 })
    const rotation = await supervisor
      .post('/api/on-call-duties/rotation')
      .send({ personIds: [a.id, b.id], from: monday, weeks: 4 })
      .expect(201)
    expect(rotation.body.weekendCounts.map((c: { weekends: number }) => c.weekends)).toEqual([2, 2])
    const { body: days } = await supervisor.get(`/api/calendar?from=${monday}&to=${DateTime.fromISO(monday).plus({ days: 6 }).toISODate()}`).expect(200)
    expect(days).toHaveLength(7)
    expect(days[0].onShift).toContain(a.name)
    expect(days[3].onCall.length).toBeGreaterThan(0)
    await supervisor
      .post('/api/on-call-duties/rotation')
      .send({ personIds: [a.id], from: DateTime.fromISO(monday).plus({ days: 1 }).toISODate(), weeks: 1 })
      .expect(400)
  })

  test('the on-call summary names who holds duty now, and a handover note is kept', async () => {
    const holder = await t.createPersonWithRole('technician', { onCallEligible: true, phone: '+61 7 5550 0199' })
    const today = DateTime.now().setZone(zone)
    await supervisor
      .post('/api/on-call-duties')
      .send({ personId: holder.id, fromDate: today.minus({ days: 1 }).toISODate(), toDate: today.plus({ days: 1 }).toISODate() })
      .expect(201)
    // Other tests leave duties too; the one that started last holds the phone, so start ours now.
    await db()
      .getRepository(OnCallEntity)
      .save({
        personId: holder.id,
        fromDate: today.toISODate()!,
        toDate: today.plus({ days: 1 }).toISODate()!,
        startsAt: new Date(Date.now() - 1000),
        endsAt: new Date(Date.now() + 3_600_000),
      })
    const { agent } = await t.signedInAgent('technician')
    await agent.post('/api/on-call/notes').send({ text: 'Bin B02 gasping at 16:00, aeration raised.' }).expect(201)
    const { body } = await agent.get('/api/on-call').expect(200)
    expect(body.now).toMatchObject({ personId: holder.id, phone: '+61 7 5550 0199' })
    expect(body.notes[0].text).toContain('Bin B02')
  })
})
