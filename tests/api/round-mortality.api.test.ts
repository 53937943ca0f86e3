import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { db } from '#server/db/data-source'
import type { Incident } from '#shared/schemas/incident'
import { MovementEntity } from '#server/modules/stock/stock.entities'
import { TaskEntity } from '#server/modules/tasks/task.entity'
import { ensureFacilityAndParameters, makeAreaWithTanks } from '#tests/support/facility-fixtures'
import { arrival, makeBatch } from '#tests/support/stock-fixtures'
import { completion, makeTankTask } from '#tests/support/task-fixtures'
import { startTestApp, type TestApp } from '#tests/support/test-app'

let t: TestApp
let supervisor: Awaited<ReturnType<TestApp['signedInAgent']>>['agent']
beforeAll(async () => {
  t = await startTestApp()
  await ensureFacilityAndParameters()
  supervisor = (await t.signedInAgent('supervisor')).agent
})
afterAll(() => t.close())

const ROUND = ['mortalities', 'do_mgL', 'temp_c']
const proposalsFor = async (taskId: number) => ((await supervisor.get('/api/incidents').expect(200)).body as Incident[]).filter((i) => i.taskId === taskId)
const movementsOf = (completionId: string) =>
  db()
    .getRepository(MovementEntity)
    .find({ where: { completionId }, order: { id: 'ASC' } })

async function stockedTankWithCheck(fish: number) {
  const { tanks } = await makeAreaWithTanks(1)
  const batch = await makeBatch()
  await supervisor
    .post('/api/stock/movements')
    .send(arrival(batch.id, tanks[0], fish))
    .expect(201)
  const task = await makeTankTask(tanks[0], { requiredReadings: ROUND })
  return { tank: tanks[0], batch, task }
}

describe('deaths counted on the round', () => {
  test('when a technician removes 3 dead fish with a cause, then one mortality movement comes off that tank’s batch', async () => {
    const { tank, batch, task } = await stockedTankWithCheck(400)
    const { agent, person } = await t.signedInAgent('technician')
    const body = completion({ mortalities: 3, do_mgL: 6.5, temp_c: 28 }, { mortality: { cause: 'Water quality', necropsy: true } })
    await agent.post(`/api/tasks/${task.id}/completion`).send(body).expect(200)
    const rows = await movementsOf(body.completionId)
    expect(rows).toHaveLength(1)
    expect(rows[0]).toMatchObject({
      kind: 'mortality',
      batchId: batch.id,
      fromTankId: tank.id,
      count: 3,
      cause: 'Water quality',
      necropsy: true,
      personId: person.id,
    })
    expect((await supervisor.get(`/api/tanks/${tank.id}/stock`)).body.count).toBe(397)
    expect((await supervisor.get('/api/stock/on-hand')).body[tank.id]).toBe(397)
  })

  test('when the same completion is replayed after the phone was offline, then exactly one mortality movement is written', async () => {
    const { tank, task } = await stockedTankWithCheck(400)
    const { agent } = await t.signedInAgent('technician')
    const body = completion({ mortalities: 2, do_mgL: 6.5, temp_c: 28 })
    const first = await agent.post(`/api/tasks/${task.id}/completion`).send(body)
    const replays = await Promise.all([1, 2, 3].map(() => agent.post(`/api/tasks/${task.id}/completion`).send(body)))
    expect(first.status).toBe(200)
    expect(replays.map((r) => r.status)).toEqual([200, 200, 200])
    expect(await movementsOf(body.completionId)).toHaveLength(1)
    expect((await supervisor.get(`/api/tanks/${tank.id}/stock`)).body.count).toBe(398)
  })

  test('when two replays of one offline completion arrive at once, then still only one movement is written', async () => {
    const { tank, task } = await stockedTankWithCheck(400)
    const { agent } = await t.signedInAgent('technician')
    const body = completion({ mortalities: 5, do_mgL: 6.5, temp_c: 28 })
    await Promise.all([agent.post(`/api/tasks/${task.id}/completion`).send(body), agent.post(`/api/tasks/${task.id}/completion`).send(body)])
    expect(await movementsOf(body.completionId)).toHaveLength(1)
    expect((await supervisor.get(`/api/tanks/${tank.id}/stock`)).body.count).toBe(395)
  })

  test('when the record is amended from 3 to 5 and back to 4, then corrections point at the one mortality and no second one is written', async () => {
    const { tank, task } = await stockedTankWithCheck(400)
    const { agent } = await t.signedInAgent('technician')
    const body = completion({ mortalities: 3, do_mgL: 6.5, temp_c: 28 })
    await agent.post(`/api/tasks/${task.id}/completion`).send(body).expect(200)
    await agent
      .post(`/api/completions/${body.completionId}/amendments`)
      .send({ reason: 'Two more found under the screen', readings: { mortalities: 5 } })
      .expect(201)
    await agent
      .post(`/api/completions/${body.completionId}/amendments`)
      .send({ reason: 'One was counted twice', readings: { mortalities: 4 } })
      .expect(201)
    const rows = await movementsOf(body.completionId)
    expect(rows.filter((r) => r.kind === 'mortality')).toHaveLength(1)
    expect(rows.filter((r) => r.kind === 'correction').map((r) => [r.count, r.correctsId])).toEqual([
      [-2, rows[0].id],
      [1, rows[0].id],
    ])
    expect((await supervisor.get(`/api/tanks/${tank.id}/stock`)).body.count).toBe(396)
  })

  test('when more fish are counted dead than the register holds, then nothing is saved and the message says what the register shows', async () => {
    const { tank, task } = await stockedTankWithCheck(2)
    const { agent } = await t.signedInAgent('technician')
    const body = completion({ mortalities: 3, do_mgL: 6.5, temp_c: 28 })
    const res = await agent.post(`/api/tasks/${task.id}/completion`).send(body).expect(400)
    expect(res.body.error.message).toMatch(new RegExp(`register shows 2 fish in ${tank.code}`))
    expect(res.body.error.fieldErrors).toHaveProperty(['readings.mortalities'])
    expect((await db().getRepository(TaskEntity).findOneByOrFail({ id: task.id })).status).toBe('open')
    expect(await movementsOf(body.completionId)).toHaveLength(0)
  })

  test('when 3 of 100 fish die in a week (above the facility’s 2 %), then the completion is flagged like a reading out of band', async () => {
    const { task } = await stockedTankWithCheck(100)
    const { agent } = await t.signedInAgent('technician')
    const res = await agent
      .post(`/api/tasks/${task.id}/completion`)
      .send(completion({ mortalities: 2, do_mgL: 6.5, temp_c: 28 }))
      .expect(200)
    // 2 dead is inside the tank's band (≤ 2) but 2 % is not above the 2 % threshold: no flag yet.
    expect(res.body.task.flag).toBeNull()
    const next = await makeTankTask({ id: task.tankId!, areaId: task.areaId! } as never, { requiredReadings: ['mortalities', 'do_mgL', 'temp_c'] })
    const second = await agent
      .post(`/api/tasks/${next.id}/completion`)
      .send(completion({ mortalities: 1, do_mgL: 6.5, temp_c: 28 }))
      .expect(200)
    expect(second.body.task.flag).toBe('watch')
    expect(second.body.notes.join(' ')).toMatch(/3\.0 % of the batch died in the last 7 days/)
  })

  test('when the cause is not on the facility’s list, then nothing is saved; "other" needs the cause in words', async () => {
    const { task } = await stockedTankWithCheck(50)
    const { agent } = await t.signedInAgent('technician')
    const notListed = await agent
      .post(`/api/tasks/${task.id}/completion`)
      .send(completion({ mortalities: 1, do_mgL: 6.5, temp_c: 28 }, { mortality: { cause: 'Moon phase' } }))
      .expect(400)
    expect(notListed.body.error.fieldErrors).toHaveProperty(['mortality.cause'])
    const silent = await agent
      .post(`/api/tasks/${task.id}/completion`)
      .send(completion({ mortalities: 1, do_mgL: 6.5, temp_c: 28 }, { mortality: { cause: 'other' } }))
      .expect(400)
    expect(silent.body.error.fieldErrors).toHaveProperty(['mortality.causeText'])
    const body = completion({ mortalities: 1, do_mgL: 6.5, temp_c: 28 }, { mortality: { cause: 'other', causeText: 'Caught in the outlet screen' } })
    await agent.post(`/api/tasks/${task.id}/completion`).send(body).expect(200)
    expect((await movementsOf(body.completionId))[0]).toMatchObject({ cause: 'other', causeText: 'Caught in the outlet screen' })
  })

  test('when the register shows the tank empty, then the round is still saved and says the deaths are kept with the readings only', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const task = await makeTankTask(tanks[0], { requiredReadings: ['mortalities', 'do_mgL', 'temp_c'] })
    const { agent } = await t.signedInAgent('technician')
    const body = completion({ mortalities: 1, do_mgL: 6.5, temp_c: 28 })
    const res = await agent.post(`/api/tasks/${task.id}/completion`).send(body).expect(200)
    expect(res.body.notes.join(' ')).toMatch(/shows no fish/)
    expect(await movementsOf(body.completionId)).toHaveLength(0)
  })
})

describe('deaths on the round against the tank’s band', () => {
  test('when more dead are removed than the tank’s band allows, then the completion is flagged as readings are, even far below the 7-day threshold', async () => {
    const { tank } = await stockedTankWithCheck(1000)
    const check = () => makeTankTask(tank, { requiredReadings: ROUND })
    const { agent } = await t.signedInAgent('technician')
    // The demo band for mortalities: up to 2 is ok, above 8 is critical (seed/demo-parameters.ts).
    const watch = await agent
      .post(`/api/tasks/${(await check()).id}/completion`)
      .send(completion({ mortalities: 5, do_mgL: 6.5, temp_c: 28 }))
      .expect(200)
    expect(watch.body.task.flag).toBe('watch')
    expect(watch.body.readings.find((r: { parameterKey: string }) => r.parameterKey === 'mortalities').band).toBe('watch')
    const critical = await agent
      .post(`/api/tasks/${(await check()).id}/completion`)
      .send(completion({ mortalities: 9, do_mgL: 6.5, temp_c: 28 }))
      .expect(200)
    expect(critical.body.task.flag).toBe('critical')
    expect(critical.body.recheckTaskId).not.toBeNull()
  })
})

describe('incidents Roundtide proposes from the round', () => {
  test('when a recheck reads critical again, then one incident is proposed for a person to decide; a recheck back in range proposes none', async () => {
    const { agent } = await t.signedInAgent('technician')
    const confirmed = await stockedTankWithCheck(40)
    const first = await agent
      .post(`/api/tasks/${confirmed.task.id}/completion`)
      .send(completion({ mortalities: 0, do_mgL: 3.1, temp_c: 28 }))
      .expect(200)
    const recheckId = first.body.recheckTaskId as number
    expect(await proposalsFor(first.body.task.id)).toEqual([])
    const body = completion({ mortalities: 0, do_mgL: 3.0, temp_c: 28 })
    await agent.post(`/api/tasks/${recheckId}/completion`).send(body).expect(200)
    await agent.post(`/api/tasks/${recheckId}/completion`).send(body).expect(200) // replayed from the phone's queue
    const [proposal, ...more] = await proposalsFor(recheckId)
    expect(more).toEqual([])
    expect(proposal).toMatchObject({ status: 'proposed', source: 'critical_recheck', tankIds: [confirmed.tank.id] })
    expect(proposal.whatHappened).toContain('do_mgL 3 mg/L')

    const recovered = await stockedTankWithCheck(40)
    const low = await agent
      .post(`/api/tasks/${recovered.task.id}/completion`)
      .send(completion({ mortalities: 0, do_mgL: 3.2, temp_c: 28 }))
      .expect(200)
    await agent
      .post(`/api/tasks/${low.body.recheckTaskId}/completion`)
      .send(completion({ mortalities: 0, do_mgL: 6.4, temp_c: 28 }))
      .expect(200)
    expect(await proposalsFor(low.body.recheckTaskId)).toEqual([])
  })

  test('when the round’s deaths take the batch over the 7-day threshold, then one incident is proposed; more deaths the same week propose no second one', async () => {
    const { tank, batch } = await stockedTankWithCheck(100)
    const check = () => makeTankTask(tank, { requiredReadings: ROUND })
    const { agent } = await t.signedInAgent('technician')
    const below = await agent
      .post(`/api/tasks/${(await check()).id}/completion`)
      .send(completion({ mortalities: 2, do_mgL: 6.5, temp_c: 28 }))
      .expect(200)
    expect(await proposalsFor(below.body.task.id)).toEqual([])
    // 2 + 1 of 100 in 7 days is 3 %, over the facility's 2 %.
    const crossing = await agent
      .post(`/api/tasks/${(await check()).id}/completion`)
      .send(completion({ mortalities: 1, do_mgL: 6.5, temp_c: 28 }))
      .expect(200)
    const [proposal] = await proposalsFor(crossing.body.task.id)
    expect(proposal).toMatchObject({ status: 'proposed', source: 'mortality_threshold', tankIds: [tank.id], batchIds: [batch.id], dead: 3 })
    const after = await agent
      .post(`/api/tasks/${(await check()).id}/completion`)
      .send(completion({ mortalities: 1, do_mgL: 6.5, temp_c: 28 }))
      .expect(200)
    expect(after.body.task.flag).toBe('watch')
    expect(await proposalsFor(after.body.task.id)).toEqual([])
  })
})
