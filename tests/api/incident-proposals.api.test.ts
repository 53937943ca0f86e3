import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import type { Incident } from '#shared/schemas/incident'
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

async function stockedTank(fish: number) {
  const { tanks } = await makeAreaWithTanks(1)
  const batch = await makeBatch()
  await supervisor.post('/api/stock/movements').send(arrival(batch.id, tanks[0], fish)).expect(201)
  return { tank: tanks[0], batch, check: () => makeTankTask(tanks[0], { requiredReadings: ROUND }) }
}

describe('deaths on the round against the tank’s band', () => {
  test('when more dead are removed than the tank’s band allows, then the completion is flagged as readings are, even far below the 7-day threshold', async () => {
    const { check } = await stockedTank(1000)
    const { agent } = await t.signedInAgent('technician')
    // The demo band for mortalities: up to 2 is ok, above 8 is critical (seed/demo-parameters.ts).
    const watch = await agent.post(`/api/tasks/${(await check()).id}/completion`).send(completion({ mortalities: 5, do_mgL: 6.5, temp_c: 28 })).expect(200)
    expect(watch.body.task.flag).toBe('watch')
    expect(watch.body.readings.find((r: { parameterKey: string }) => r.parameterKey === 'mortalities').band).toBe('watch')
    const critical = await agent.post(`/api/tasks/${(await check()).id}/completion`).send(completion({ mortalities: 9, do_mgL: 6.5, temp_c: 28 })).expect(200)
    expect(critical.body.task.flag).toBe('critical')
    expect(critical.body.recheckTaskId).not.toBeNull()
  })
})

describe('incidents Roundtide proposes from the round', () => {
  test('when a recheck reads critical again, then one incident is proposed for a person to decide; a recheck back in range proposes none', async () => {
    const { agent } = await t.signedInAgent('technician')
    const confirmed = await stockedTank(40)
    const first = await agent.post(`/api/tasks/${(await confirmed.check()).id}/completion`).send(completion({ mortalities: 0, do_mgL: 3.1, temp_c: 28 })).expect(200)
    const recheckId = first.body.recheckTaskId as number
    expect(await proposalsFor(first.body.task.id)).toEqual([])
    const body = completion({ mortalities: 0, do_mgL: 3.0, temp_c: 28 })
    await agent.post(`/api/tasks/${recheckId}/completion`).send(body).expect(200)
    await agent.post(`/api/tasks/${recheckId}/completion`).send(body).expect(200) // replayed from the phone's queue
    const [proposal, ...more] = await proposalsFor(recheckId)
    expect(more).toEqual([])
    expect(proposal).toMatchObject({ status: 'proposed', source: 'critical_recheck', tankIds: [confirmed.tank.id] })
    expect(proposal.whatHappened).toContain('do_mgL 3 mg/L')

    const recovered = await stockedTank(40)
    const low = await agent.post(`/api/tasks/${(await recovered.check()).id}/completion`).send(completion({ mortalities: 0, do_mgL: 3.2, temp_c: 28 })).expect(200)
    await agent.post(`/api/tasks/${low.body.recheckTaskId}/completion`).send(completion({ mortalities: 0, do_mgL: 6.4, temp_c: 28 })).expect(200)
    expect(await proposalsFor(low.body.recheckTaskId)).toEqual([])
  })

  test('when the round’s deaths take the batch over the 7-day threshold, then one incident is proposed; more deaths the same week propose no second one', async () => {
    const { tank, batch, check } = await stockedTank(100)
    const { agent } = await t.signedInAgent('technician')
    const below = await agent.post(`/api/tasks/${(await check()).id}/completion`).send(completion({ mortalities: 2, do_mgL: 6.5, temp_c: 28 })).expect(200)
    expect(await proposalsFor(below.body.task.id)).toEqual([])
    // 2 + 1 of 100 in 7 days is 3 %, over the facility's 2 %.
    const crossing = await agent.post(`/api/tasks/${(await check()).id}/completion`).send(completion({ mortalities: 1, do_mgL: 6.5, temp_c: 28 })).expect(200)
    const [proposal] = await proposalsFor(crossing.body.task.id)
    expect(proposal).toMatchObject({ status: 'proposed', source: 'mortality_threshold', tankIds: [tank.id], batchIds: [batch.id], dead: 3 })
    const after = await agent.post(`/api/tasks/${(await check()).id}/completion`).send(completion({ mortalities: 1, do_mgL: 6.5, temp_c: 28 })).expect(200)
    expect(after.body.task.flag).toBe('watch')
    expect(await proposalsFor(after.body.task.id)).toEqual([])
  })
})
