import fc from 'fast-check'
import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { ensureFacilityAndParameters, makeAreaWithTanks } from '#tests/support/facility-fixtures'
import { arrival, makeBatch } from '#tests/support/stock-fixtures'
import { startTestApp, type TestApp } from '#tests/support/test-app'
import type { Tank } from '#shared/schemas/facility'

let t: TestApp
let supervisor: Awaited<ReturnType<TestApp['signedInAgent']>>['agent']
beforeAll(async () => {
  t = await startTestApp()
  await ensureFacilityAndParameters()
  supervisor = (await t.signedInAgent('supervisor')).agent
})
afterAll(() => t.close())

describe('the stock register', () => {
  test('when fish arrive, move, die and leave, then the tank and batch figures come from the register, with biomass and density', async () => {
    const { tanks } = await makeAreaWithTanks(2)
    const batch = await makeBatch([], { meanWeightG: 40 })
    const a = await supervisor
      .post('/api/stock/movements')
      .send(arrival(batch.id, tanks[0], 600, { meanWeightG: 40, transportWater: { tempC: 27.5, pH: 7.6, doMgL: 8.1 } }))
      .expect(201)
    expect(a.body).toMatchObject({ kind: 'arrival', count: 600, toTankCode: tanks[0].code, permitRef: 'PERMIT-0001', transportWater: { tempC: 27.5 } })
    await supervisor
      .post('/api/stock/movements')
      .send({ kind: 'transfer', batchId: batch.id, fromTankId: tanks[0].id, toTankId: tanks[1].id, count: 250 })
      .expect(201)
    await supervisor
      .post('/api/stock/movements')
      .send({ kind: 'mortality', batchId: batch.id, fromTankId: tanks[1].id, count: 4, cause: 'Jumped out', necropsy: true })
      .expect(201)
    await supervisor
      .post('/api/stock/movements')
      .send({ kind: 'dispatch', batchId: batch.id, fromTankId: tanks[0].id, count: 100, destination: 'Invented partner lab' })
      .expect(201)

    const tank = await supervisor.get(`/api/tanks/${tanks[1].id}/stock`).expect(200)
    // 246 fish × 40 g = 9.84 kg in 1,000 L (1 m³): 9.84 kg/m³.
    expect(tank.body).toMatchObject({ count: 246, biomassKg: 9.84, densityKgM3: 9.84 })
    const stock = await supervisor.get(`/api/batches/${batch.id}/stock`).expect(200)
    expect(stock.body).toMatchObject({ count: 496, onRegister: true })
    expect(stock.body.tanks.map((x: { count: number }) => x.count).sort()).toEqual([246, 250])
    const catalogue = await supervisor.get(`/api/batches/${batch.id}`).expect(200)
    expect(catalogue.body).toMatchObject({ count: 496 })
    expect(catalogue.body.tankIds.sort()).toEqual([tanks[0].id, tanks[1].id].sort())
    const ledger = await supervisor.get(`/api/stock/movements?batchId=${batch.id}`).expect(200)
    expect(ledger.body.map((m: { kind: string }) => m.kind)).toEqual(['dispatch', 'mortality', 'transfer', 'arrival'])
  })

  test('when a movement would take a tank below zero, then it is refused with a clear message and nothing is written', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const batch = await makeBatch()
    await supervisor
      .post('/api/stock/movements')
      .send(arrival(batch.id, tanks[0], 10))
      .expect(201)
    const res = await supervisor
      .post('/api/stock/movements')
      .send({ kind: 'cull', batchId: batch.id, fromTankId: tanks[0].id, count: 11, reason: 'Deformed' })
      .expect(400)
    expect(res.body.error.message).toMatch(new RegExp(`register shows 10 fish of this batch in ${tanks[0].code}`))
    expect(res.body.error.fieldErrors).toHaveProperty('count')
    const ledger = await supervisor.get(`/api/stock/movements?batchId=${batch.id}`).expect(200)
    expect(ledger.body).toHaveLength(1)
  })

  test('when a count is corrected, then the correction is a new row pointing at what it corrects, and needs a reason', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const batch = await makeBatch()
    const first = await supervisor
      .post('/api/stock/movements')
      .send(arrival(batch.id, tanks[0], 300))
      .expect(201)
    const bad = await supervisor
      .post('/api/stock/movements')
      .send({ kind: 'correction', batchId: batch.id, tankId: tanks[0].id, delta: -8, reason: '' })
      .expect(400)
    expect(bad.body.error.fieldErrors).toHaveProperty('reason')
    const fix = await supervisor
      .post('/api/stock/movements')
      .send({ kind: 'correction', batchId: batch.id, tankId: tanks[0].id, delta: -8, reason: 'Box 3 was counted twice at arrival', correctsId: first.body.id })
      .expect(201)
    expect(fix.body).toMatchObject({ kind: 'correction', count: -8, correctsId: first.body.id })
    const ledger = await supervisor.get(`/api/stock/movements?batchId=${batch.id}`).expect(200)
    expect(ledger.body.find((m: { id: number }) => m.id === first.body.id)).toMatchObject({ count: 300 })
    expect((await supervisor.get(`/api/batches/${batch.id}/stock`)).body.count).toBe(292)
  })

  test('who may write: observers read only, technicians record losses but not arrivals or corrections', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const batch = await makeBatch()
    await supervisor
      .post('/api/stock/movements')
      .send(arrival(batch.id, tanks[0], 50))
      .expect(201)
    const observer = (await t.signedInAgent('observer')).agent
    await observer.get(`/api/stock/movements?tankId=${tanks[0].id}`).expect(200)
    await observer.post('/api/stock/movements').send({ kind: 'mortality', batchId: batch.id, fromTankId: tanks[0].id, count: 1 }).expect(403)
    const tech = (await t.signedInAgent('technician')).agent
    await tech.post('/api/stock/movements').send({ kind: 'mortality', batchId: batch.id, fromTankId: tanks[0].id, count: 1 }).expect(201)
    await tech
      .post('/api/stock/movements')
      .send(arrival(batch.id, tanks[0], 5))
      .expect(403)
    await tech
      .post('/api/stock/movements')
      .send({ kind: 'correction', batchId: batch.id, tankId: tanks[0].id, delta: 1, reason: 'Recounted today' })
      .expect(403)
  })
})

describe('the register under a generated sequence of movements', () => {
  test('over 200 random sequences through the API, no count is ever negative and on hand always equals in − out', async () => {
    const { tanks } = await makeAreaWithTanks(3)
    const tankAt = (i: number): Tank => tanks[i % 3]
    const step = fc.record({
      kind: fc.constantFrom('arrival', 'transfer', 'grading', 'mortality', 'cull', 'sampling', 'dispatch', 'correction'),
      a: fc.nat(2),
      b: fc.nat(2),
      n: fc.integer({ min: 1, max: 40 }),
      down: fc.boolean(),
    })
    let runs = 0
    await fc.assert(
      fc.asyncProperty(fc.array(step, { minLength: 1, maxLength: 6 }), async (steps) => {
        runs++
        const batch = await makeBatch()
        const model = [0, 0, 0]
        let inMinusOut = 0
        for (const s of steps) {
          const from = tankAt(s.a)
          const to = tankAt(s.a === s.b ? s.b + 1 : s.b)
          const body =
            s.kind === 'arrival'
              ? arrival(batch.id, to, s.n)
              : s.kind === 'transfer' || s.kind === 'grading'
                ? { kind: s.kind, batchId: batch.id, fromTankId: from.id, toTankId: to.id, count: s.n }
                : s.kind === 'correction'
                  ? { kind: 'correction', batchId: batch.id, tankId: to.id, delta: s.down ? -s.n : s.n, reason: 'Stock check recount' }
                  : { kind: s.kind, batchId: batch.id, fromTankId: from.id, count: s.n, reason: 'Generated', destination: 'Generated' }
          const changes: Array<[number, number]> =
            s.kind === 'arrival'
              ? [[tanks.indexOf(to), s.n]]
              : s.kind === 'transfer' || s.kind === 'grading'
                ? [
                    [tanks.indexOf(from), -s.n],
                    [tanks.indexOf(to), s.n],
                  ]
                : s.kind === 'correction'
                  ? [[tanks.indexOf(to), s.down ? -s.n : s.n]]
                  : [[tanks.indexOf(from), -s.n]]
          const fits = changes.every(([i, d]) => model[i] + d >= 0)
          const res = await supervisor.post('/api/stock/movements').send(body)
          expect(res.status).toBe(fits ? 201 : 400)
          if (fits) {
            for (const [i, d] of changes) model[i] += d
            inMinusOut += changes.reduce((sum, [, d]) => sum + d, 0)
          }
        }
        const stock = (await supervisor.get(`/api/batches/${batch.id}/stock`).expect(200)).body
        expect(stock.count).toBe(inMinusOut)
        expect(stock.tanks.every((x: { count: number }) => x.count > 0)).toBe(true)
        for (const [i, tank] of tanks.entries()) expect(stock.tanks.find((x: { tankId: number }) => x.tankId === tank.id)?.count ?? 0).toBe(model[i])
      }),
      { numRuns: 200 },
    )
    expect(runs).toBeGreaterThanOrEqual(200)
  }, 600_000)
})
