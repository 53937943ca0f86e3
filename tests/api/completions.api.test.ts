import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { db } from '#server/db/data-source'
import { CompletionEntity, ReadingEntity, AlertEntity } from '#server/modules/completions/completion.entities'
import { TaskEntity } from '#server/modules/tasks/task.entity'
import { ensureFacilityAndParameters, makeAreaWithTanks } from '#tests/support/facility-fixtures'
import { completion, makeTankTask, setSystemLimit } from '#tests/support/task-fixtures'
import { startTestApp, type TestApp } from '#tests/support/test-app'

let t: TestApp
beforeAll(async () => {
  t = await startTestApp()
  await ensureFacilityAndParameters()
})
afterAll(() => t.close())

const readingsOf = (taskId: number) => db().getRepository(ReadingEntity).find({ where: { taskId } })

describe('POST /api/tasks/:id/completion', () => {
  test('when DO and temperature are in range, then the task is done with banded readings and a derived % saturation', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const task = await makeTankTask(tanks[0])
    const { agent, person } = await t.signedInAgent('technician')
    const res = await agent
      .post(`/api/tasks/${task.id}/completion`)
      .send(completion({ do_mgL: 6.8, temp_c: 28.4 }))
      .expect(200)
    expect(res.body.task).toMatchObject({ status: 'done', flag: null, completedById: person.id, lateMinutes: null })
    expect(res.body.recheckTaskId).toBeNull()
    const pct = res.body.readings.find((r: { parameterKey: string }) => r.parameterKey === 'do_pct')
    expect(pct.derived).toBe(true)
    expect(pct.value).toBeGreaterThan(80) // 6.8 mg/L at 28.4 °C in near-fresh water is ~87 % (B&K)
    expect(pct.value).toBeLessThan(95)
    const rows = await readingsOf(task.id)
    expect(rows.map((r) => r.parameterKey).sort()).toEqual(['do_mgL', 'do_pct', 'temp_c'])
    expect(rows.every((r) => r.personId === person.id && r.tankId === tanks[0].id)).toBe(true)
  })

  test('when a required reading is missing, then it answers 400 naming it and saves nothing', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const task = await makeTankTask(tanks[0])
    const { agent } = await t.signedInAgent('technician')
    const res = await agent
      .post(`/api/tasks/${task.id}/completion`)
      .send(completion({ do_mgL: 6.8 }))
      .expect(400)
    expect(res.body.error.fieldErrors).toHaveProperty(['readings.temp_c'])
    expect(await readingsOf(task.id)).toHaveLength(0)
    expect((await db().getRepository(TaskEntity).findOneByOrFail({ id: task.id })).status).toBe('open')
  })

  test('when a value is physically impossible (pH 15, DO −1), then it answers 400 with the field and saves nothing', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const task = await makeTankTask(tanks[0], { requiredReadings: ['ph', 'do_mgL'] })
    const { agent } = await t.signedInAgent('technician')
    const res = await agent
      .post(`/api/tasks/${task.id}/completion`)
      .send(completion({ ph: 15, do_mgL: -1 }))
      .expect(400)
    expect(res.body.error.fieldErrors['readings.ph'][0]).toMatch(/impossible/)
    expect(res.body.error.fieldErrors).toHaveProperty(['readings.do_mgL'])
    expect(await readingsOf(task.id)).toHaveLength(0)
    const nonNumeric = await agent
      .post(`/api/tasks/${task.id}/completion`)
      .send(completion({ ph: 'seven' as unknown as number, do_mgL: 6 }))
      .expect(400)
    expect(nonNumeric.body.error.fieldErrors).toHaveProperty(['readings.ph'])
  })

  test('when DO is below the critical limit, then it is accepted, flagged critical, a recheck is made and an escalation starts', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const task = await makeTankTask(tanks[0])
    const { agent, person } = await t.signedInAgent('technician')
    const res = await agent
      .post(`/api/tasks/${task.id}/completion`)
      .send(completion({ do_mgL: 3.1, temp_c: 28 }))
      .expect(200)
    expect(res.body.task.flag).toBe('critical')
    expect(res.body.readings.find((r: { parameterKey: string }) => r.parameterKey === 'do_mgL').band).toBe('critical')
    const recheck = await db().getRepository(TaskEntity).findOneByOrFail({ id: res.body.recheckTaskId })
    expect(recheck).toMatchObject({ recheckOfTaskId: task.id, assigneeId: person.id, tankId: tanks[0].id, status: 'open' })
    const minutes = (recheck.dueAt.getTime() - Date.now()) / 60_000
    expect(minutes).toBeGreaterThan(28)
    expect(minutes).toBeLessThanOrEqual(30)
    expect(await db().getRepository(AlertEntity).findOneBy({ taskId: task.id, kind: 'critical_reading' })).not.toBeNull()
  })

  test('when a system override narrows the salinity range, then the same value is ok elsewhere but watch in that system', async () => {
    const a = await makeAreaWithTanks(1)
    const b = await makeAreaWithTanks(1)
    await setSystemLimit(b.system.id, 'salinity', { okMin: 14, okMax: 16, criticalMin: 11, criticalMax: 19 })
    const { agent } = await t.signedInAgent('supervisor')
    const inA = await makeTankTask(a.tanks[0], { requiredReadings: ['salinity'] })
    const inB = await makeTankTask(b.tanks[0], { requiredReadings: ['salinity'] })
    const ra = await agent
      .post(`/api/tasks/${inA.id}/completion`)
      .send(completion({ salinity: 12.5 }))
      .expect(200)
    const rb = await agent
      .post(`/api/tasks/${inB.id}/completion`)
      .send(completion({ salinity: 12.5 }))
      .expect(200)
    expect(ra.body.task.flag).toBeNull()
    expect(rb.body.task.flag).toBe('watch')
    expect(rb.body.recheckTaskId).toEqual(expect.any(Number))
  })

  test('when done after the due time, then it is recorded as late with the minutes', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const task = await makeTankTask(tanks[0], { dueAt: new Date(Date.now() - 47 * 60_000) })
    const { agent } = await t.signedInAgent('technician')
    const res = await agent
      .post(`/api/tasks/${task.id}/completion`)
      .send(completion({ do_mgL: 6.5, temp_c: 28 }))
      .expect(200)
    expect(res.body.task.lateMinutes).toBeGreaterThanOrEqual(46)
    expect(res.body.task.lateMinutes).toBeLessThanOrEqual(48)
  })

  test('when two people complete the same task at once, then exactly one wins and the other gets 409 naming the winner', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const task = await makeTankTask(tanks[0])
    const one = await t.signedInAgent('technician')
    const two = await t.signedInAgent('supervisor')
    const [a, b] = await Promise.all([
      one.agent.post(`/api/tasks/${task.id}/completion`).send(completion({ do_mgL: 6.5, temp_c: 28 })),
      two.agent.post(`/api/tasks/${task.id}/completion`).send(completion({ do_mgL: 6.6, temp_c: 28 })),
    ])
    expect([a.status, b.status].sort()).toEqual([200, 409])
    const loser = a.status === 409 ? a : b
    const winner = a.status === 200 ? one.person : two.person
    expect(loser.body.error.message).toContain(winner.name)
    expect(await db().getRepository(CompletionEntity).countBy({ taskId: task.id })).toBe(1)
    expect((await readingsOf(task.id)).filter((r) => !r.derived)).toHaveLength(2)
  })

  test('when the same completion id is sent again, then the first result comes back and nothing new is made', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const task = await makeTankTask(tanks[0])
    const { agent } = await t.signedInAgent('technician')
    const body = completion({ do_mgL: 4.5, temp_c: 28 })
    const first = await agent.post(`/api/tasks/${task.id}/completion`).send(body).expect(200)
    const again = await agent.post(`/api/tasks/${task.id}/completion`).send(body).expect(200)
    expect(again.body).toEqual(first.body)
    expect(await readingsOf(task.id)).toHaveLength(3)
    expect(await db().getRepository(TaskEntity).countBy({ recheckOfTaskId: task.id })).toBe(1)
  })

  test('who may complete: observers never, a technician not someone else’s task, a supervisor anything', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const other = await t.createPersonWithRole('technician')
    const task = await makeTankTask(tanks[0], { assigneeId: other.id })
    const observer = await t.signedInAgent('observer')
    await observer.agent
      .post(`/api/tasks/${task.id}/completion`)
      .send(completion({ do_mgL: 6, temp_c: 28 }))
      .expect(403)
    const tech = await t.signedInAgent('technician')
    const refused = await tech.agent
      .post(`/api/tasks/${task.id}/completion`)
      .send(completion({ do_mgL: 6, temp_c: 28 }))
      .expect(403)
    expect(refused.body.error.message).toMatch(/assigned to someone else/)
    const sup = await t.signedInAgent('supervisor')
    await sup.agent
      .post(`/api/tasks/${task.id}/completion`)
      .send(completion({ do_mgL: 6, temp_c: 28 }))
      .expect(200)
  })

  test('when a task cannot be done, then it is skipped with the reason and no readings are needed', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const task = await makeTankTask(tanks[0])
    const { agent } = await t.signedInAgent('technician')
    await agent
      .post(`/api/tasks/${task.id}/completion`)
      .send(completion({}, { outcome: 'skipped' }))
      .expect(400)
    const res = await agent
      .post(`/api/tasks/${task.id}/completion`)
      .send(completion({}, { outcome: 'skipped', skipReason: 'equipment_fault', note: 'DO meter battery flat' }))
      .expect(200)
    expect(res.body.task.status).toBe('skipped')
    const row = await db().getRepository(CompletionEntity).findOneByOrFail({ taskId: task.id })
    expect(row).toMatchObject({ outcome: 'skipped', skipReason: 'equipment_fault', note: 'DO meter battery flat' })
  })
})

describe('taking a task and photos', () => {
  test('when a technician takes an unassigned task, then it becomes theirs and nobody else can take it', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const task = await makeTankTask(tanks[0])
    const me = await t.signedInAgent('technician')
    const res = await me.agent.post(`/api/tasks/${task.id}/take`).expect(200)
    expect(res.body.assigneeId).toBe(me.person.id)
    const other = await t.signedInAgent('technician')
    await other.agent.post(`/api/tasks/${task.id}/take`).expect(409)
  })

  test('when a photo is too large or not an image, then it answers 413 or 415; a real PNG is kept', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const task = await makeTankTask(tanks[0])
    const { agent } = await t.signedInAgent('technician')
    const png = Buffer.concat([Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]), Buffer.alloc(64)])
    await agent
      .post(`/api/tasks/${task.id}/photos`)
      .attach('photo', Buffer.alloc(9 * 1024 * 1024, 1), 'big.jpg')
      .expect(413)
    await agent
      .post(`/api/tasks/${task.id}/photos`)
      .attach('photo', Buffer.from('<script>alert(1)</script>'), { filename: 'x.png', contentType: 'image/png' })
      .expect(415)
    const ok = await agent.post(`/api/tasks/${task.id}/photos`).attach('photo', png, { filename: '../../etc/passwd.png', contentType: 'image/png' }).expect(201)
    const list = await agent.get(`/api/tasks/${task.id}/photos`).expect(200)
    expect(list.body.map((p: { id: string }) => p.id)).toContain(ok.body.id)
    const file = await agent.get(`/api/photos/${ok.body.id}`).expect(200)
    expect(file.headers['content-type']).toBe('image/png')
  })
})
