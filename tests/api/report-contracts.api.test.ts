import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import type request from 'supertest'
import { z } from 'zod'
import { batches } from '#server/modules/facility/catalogues'
import { IncidentReportRowSchema, StockReportRowSchema } from '#shared/schemas/animal-report'
import { AuditRowSchema, ComplianceRowSchema, ResponseRowSchema, WelfareRowSchema } from '#shared/schemas/report'
import { TankOverviewSchema, TankReadingsSchema } from '#shared/schemas/tank-page'
import { ensureFacilityAndParameters, makeAreaWithTanks, uniqueCode } from '#tests/support/facility-fixtures'
import { completion, makeTankTask } from '#tests/support/task-fixtures'
import { startTestApp, type TestApp } from '#tests/support/test-app'

let t: TestApp
let manager: request.Agent
beforeAll(async () => {
  t = await startTestApp()
  await ensureFacilityAndParameters()
  manager = (await t.signedInAgent('manager')).agent
})
afterAll(() => t.close())

/** The answer is exactly the shared shape: parsing keeps every field and adds none (an extra field would be stripped and differ). */
function expectExactly(schema: z.ZodType, body: unknown) {
  expect(schema.parse(body)).toEqual(body)
}

describe('the reports and the tank page answer the shapes the client parses', () => {
  test('a tank with a batch, a record and a critical check: overview, readings and every report match shared/schemas', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const tank = tanks[0]
    const batch = await batches.create({ code: uniqueCode('B'), species: 'Barramundi', origin: 'Invented hatchery', arrivalDate: '2026-11-01', count: 300, meanWeightG: 4, tankIds: [tank.id], status: 'active', feedRatePct: 3 })
    const { agent } = await t.signedInAgent('technician')
    await agent.post(`/api/batches/${batch.id}/records`).send({ kind: 'note', text: 'Fish feeding well' }).expect(201)
    const task = await makeTankTask(tank)
    // 3.1 mg/L is below the demo critical minimum of 4, so the check is flagged, rechecked and escalated.
    await agent.post(`/api/tasks/${task.id}/completion`).send(completion({ do_mgL: 3.1, temp_c: 28 })).expect(200)

    const overview = (await agent.get(`/api/tanks/${tank.id}/overview`).expect(200)).body
    expectExactly(TankOverviewSchema, overview)
    expect(overview.batchRecords).toEqual([expect.objectContaining({ kind: 'note', data: expect.objectContaining({ text: 'Fish feeding well' }) })])
    expect(overview.recentTasks.map((x: { id: number }) => x.id)).toContain(task.id)

    const window = new URLSearchParams({ from: new Date(Date.now() - 86_400_000).toISOString(), to: new Date(Date.now() + 60_000).toISOString() })
    const readings = (await agent.get(`/api/tanks/${tank.id}/readings?${window}`).expect(200)).body
    expectExactly(TankReadingsSchema, readings)
    expect(readings.tank).toEqual(expect.arrayContaining([expect.objectContaining({ parameterKey: 'do_mgL', value: 3.1, band: 'critical' })]))

    const day = `from=${task.localDate}&to=${task.localDate}`
    const reports: Array<[string, z.ZodType]> = [
      [`/api/reports/compliance?${day}&by=area`, ComplianceRowSchema],
      [`/api/reports/responses?${day}`, ResponseRowSchema],
      [`/api/reports/welfare?${day}&tankIds=${tank.id}`, WelfareRowSchema],
      [`/api/reports/stock?${day}`, StockReportRowSchema],
      [`/api/reports/incidents?${day}`, IncidentReportRowSchema],
      [`/api/audit?${day}`, AuditRowSchema],
    ]
    for (const [path, row] of reports) {
      const body = (await manager.get(path).expect(200)).body
      expectExactly(z.array(row), body)
    }
    const responses = (await manager.get(`/api/reports/responses?${day}`).expect(200)).body
    expect(responses).toEqual(expect.arrayContaining([expect.objectContaining({ flag: 'critical', alert: 'critical_reading', recheckStatus: 'open' })]))
    const welfare = (await manager.get(`/api/reports/welfare?${day}&tankIds=${tank.id}`).expect(200)).body
    expect(welfare).toEqual(expect.arrayContaining([expect.objectContaining({ status: 'done', flag: 'critical' })]))
  })
})
