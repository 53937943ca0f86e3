import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { db } from '#server/db/data-source'
import { tanks } from '#server/modules/facility/catalogues'
import { PersonEntity } from '#server/modules/people/person.entity'
import { createShift } from '#server/modules/roster/roster.service'
import { createRoutine, updateRoutine } from '#server/modules/routines/routines.service'
import { materialise } from '#server/modules/scheduling/materialiser'
import { TaskEntity } from '#server/modules/tasks/task.entity'
import { ensureFacilityAndParameters, makeAreaWithTanks, routineData } from '#tests/support/facility-fixtures'
import { startTestApp, type TestApp } from '#tests/support/test-app'

let t: TestApp
beforeAll(async () => {
  t = await startTestApp()
  await ensureFacilityAndParameters()
})
afterAll(() => t.close())

const tasksOf = (routineId: number) =>
  db()
    .getRepository(TaskEntity)
    .find({ where: { routineId }, order: { dueAt: 'ASC' } })

describe('materialiser', () => {
  test('a routine naming a person who has left makes unassigned tasks; one for whoever is on shift gives them to the rostered technician', async () => {
    const { tanks: made } = await makeAreaWithTanks(1)
    const left = await t.createPersonWithRole('technician')
    await db().getRepository(PersonEntity).update(left.id, { active: false })
    const named = await createRoutine(routineData({ targetIds: [made[0].id], assigneeRule: { kind: 'person', personId: left.id } }))
    expect((await tasksOf(named.id)).every((x) => x.assigneeId === null)).toBe(true)

    const rostered = await t.createPersonWithRole('technician')
    const farDay = new Date(Date.now() + 500 * 86_400_000).toISOString().slice(0, 10)
    await createShift({ personId: rostered.id, date: farDay, start: '00:00', end: '23:59', kind: 'day' })
    const onShift = await createRoutine(
      routineData({
        targetIds: [made[0].id],
        dtstart: `${farDay}T10:00:00`,
        rrule: 'FREQ=DAILY;COUNT=1',
        assigneeRule: { kind: 'role_on_shift', role: 'technician' },
      }),
    )
    await materialise({ routineIds: [onShift.id], from: new Date(Date.parse(farDay) - 86_400_000), horizonDays: 3 })
    const [task] = await tasksOf(onShift.id)
    expect(task.localDate).toBe(farDay)
    // Other tests roster technicians on other days only; this far day is ours.
    expect(task.assigneeId).toBe(rostered.id)
  })

  test('when it runs twice, then the second run creates nothing', async () => {
    const { tanks: made } = await makeAreaWithTanks(2)
    const routine = await createRoutine(routineData({ targetIds: made.map((x) => x.id) }))
    const before = (await tasksOf(routine.id)).length
    expect(before).toBeGreaterThanOrEqual(2 * 41) // 2 tanks × a 42-day horizon (today may be partly past)
    const again = await materialise({ routineIds: [routine.id] })
    expect(again.created).toBe(0)
    expect((await tasksOf(routine.id)).length).toBe(before)
  })

  test('when a routine is edited, then untouched future tasks move and a manually assigned or done one stays', async () => {
    const { tanks: made } = await makeAreaWithTanks(1)
    const routine = await createRoutine(routineData({ targetIds: [made[0].id], dtstart: '2026-01-05T07:30:00' }))
    const [first, second] = (await tasksOf(routine.id)).filter((x) => x.dueAt > new Date())
    const person = await t.createPersonWithRole('technician')
    await db().getRepository(TaskEntity).update(first.id, { assigneeId: person.id, assignedManually: true })
    await db().getRepository(TaskEntity).update(second.id, { status: 'done', completedAt: new Date(), completedById: person.id })

    await updateRoutine(routine.id, {
      ...routineData({ name: routine.name, targetIds: [made[0].id], dtstart: '2026-01-05T09:00:00' }),
      version: routine.version,
    })

    const after = await tasksOf(routine.id)
    const ids = after.map((x) => x.id)
    expect(ids).toContain(first.id)
    expect(ids).toContain(second.id)
    const future = after.filter((x) => x.dueAt > new Date() && x.id !== first.id && x.id !== second.id)
    expect(future.length).toBeGreaterThan(30)
    expect(future.every((x) => x.localStart.endsWith('T09:00:00'))).toBe(true)
  })

  test('when a routine is edited with a stale version, then it answers conflict and nothing changes', async () => {
    const { tanks: made } = await makeAreaWithTanks(1)
    const routine = await createRoutine(routineData({ targetIds: [made[0].id] }))
    await expect(updateRoutine(routine.id, { ...routineData({ targetIds: [made[0].id] }), version: routine.version + 5 })).rejects.toMatchObject({
      status: 409,
    })
  })

  test('when a routine is paused, then its future untouched tasks go and none come back on the next run', async () => {
    const { tanks: made } = await makeAreaWithTanks(1)
    const routine = await createRoutine(routineData({ targetIds: [made[0].id] }))
    await updateRoutine(routine.id, { ...routineData({ name: routine.name, targetIds: [made[0].id], paused: true }), version: routine.version })
    await materialise()
    expect((await tasksOf(routine.id)).filter((x) => x.dueAt > new Date())).toHaveLength(0)
  })

  test('when a tank is emptied, then its future untouched tasks go; when refilled, they return', async () => {
    const { tanks: made } = await makeAreaWithTanks(2)
    const routine = await createRoutine(routineData({ targetIds: made.map((x) => x.id) }))
    await tanks.update(made[0].id, { inUse: false })
    let future = (await tasksOf(routine.id)).filter((x) => x.dueAt > new Date())
    expect(future.some((x) => x.tankId === made[0].id)).toBe(false)
    expect(future.some((x) => x.tankId === made[1].id)).toBe(true)
    await tanks.update(made[0].id, { inUse: true })
    future = (await tasksOf(routine.id)).filter((x) => x.dueAt > new Date())
    expect(future.some((x) => x.tankId === made[0].id)).toBe(true)
  })

  test('when a routine has an invalid rule or an unknown reading, then it is refused naming the field', async () => {
    const { tanks: made } = await makeAreaWithTanks(1)
    await expect(createRoutine(routineData({ targetIds: [made[0].id], rrule: 'FREQ=SOMETIMES' }))).rejects.toMatchObject({
      status: 400,
      fieldErrors: { rrule: expect.any(Array) },
    })
    await expect(createRoutine(routineData({ targetIds: [made[0].id], requiredReadings: ['unicorns'] }))).rejects.toMatchObject({
      status: 400,
      fieldErrors: { requiredReadings: expect.any(Array) },
    })
  })
})
