import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import type request from 'supertest'
import { ensureFacilityAndParameters, makeAreaWithTanks, routineInput } from '#tests/support/facility-fixtures'
import { startTestApp, type TestApp } from '#tests/support/test-app'

let t: TestApp
let supervisor: request.Agent
let technician: request.Agent
let observer: request.Agent
beforeAll(async () => {
  t = await startTestApp()
  await ensureFacilityAndParameters()
  supervisor = (await t.signedInAgent('supervisor')).agent
  technician = (await t.signedInAgent('technician')).agent
  observer = (await t.signedInAgent('observer')).agent
})
afterAll(() => t.close())

describe('routines and tasks API', () => {
  test('when a supervisor creates a Mon/Wed/Fri 10:15 routine, then the tasks of the next Monday are listed at 10:15 local', async () => {
    const { tanks, area } = await makeAreaWithTanks(3)
    const { body: routine } = await supervisor
      .post('/api/routines')
      .send(routineInput({ rrule: 'FREQ=WEEKLY;BYDAY=MO,WE,FR', dtstart: '2026-01-05T10:15:00', targetIds: tanks.map((x) => x.id) }))
      .expect(201)
    const from = new Date().toISOString().slice(0, 10)
    const to = new Date(Date.now() + 20 * 86_400_000).toISOString().slice(0, 10)
    const { body: list } = await technician.get(`/api/tasks?routineId=${routine.id}&from=${from}&to=${to}`).expect(200)
    const mondays = list.filter((x: { localDate: string }) => new Date(`${x.localDate}T00:00:00Z`).getUTCDay() === 1)
    expect(mondays.length).toBeGreaterThanOrEqual(3)
    const nextMonday = mondays[0].localDate
    const { body: day } = await technician.get(`/api/tasks?date=${nextMonday}&routineId=${routine.id}&areaId=${area.id}`).expect(200)
    expect(day).toHaveLength(3)
    expect(day.every((x: { localTime: string; requiredReadings: string[] }) => x.localTime === '10:15' && x.requiredReadings.includes('do_mgL'))).toBe(true)
    expect(new Set(day.map((x: { targetLabel: string }) => x.targetLabel)).size).toBe(3)
  })

  test('when a technician or observer tries to create a routine, then it is refused', async () => {
    await technician
      .post('/api/routines')
      .send(routineInput({ targetKind: 'facility' }))
      .expect(403)
    await observer
      .post('/api/routines')
      .send(routineInput({ targetKind: 'facility' }))
      .expect(403)
  })

  test('when the task list has no date, or a range that is backwards or too long, then it answers 400', async () => {
    await technician.get('/api/tasks').expect(400)
    await technician.get('/api/tasks?from=2026-05-10&to=2026-05-01').expect(400)
    await technician.get('/api/tasks?from=2026-01-01&to=2026-06-01').expect(400)
    await technician.get('/api/tasks?date=2026-13-45x').expect(400)
  })

  test('when a supervisor adds a one-off task, then it is listed on its day and readable by id', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const { body: task } = await supervisor
      .post('/api/tasks')
      .send({ title: 'Check the spare pump', category: 'maintenance', targetKind: 'tank', targetId: tanks[0].id, localStart: '2027-03-03T11:00' })
      .expect(201)
    expect(task).toMatchObject({ localDate: '2027-03-03', localTime: '11:00', status: 'planned', routineId: null })
    const { body: same } = await technician.get(`/api/tasks/${task.id}`).expect(200)
    expect(same.title).toBe('Check the spare pump')
    await technician.post('/api/tasks').send({ title: 'x', category: 'maintenance', targetKind: 'facility', localStart: '2027-03-03T11:00' }).expect(403)
  })
})
