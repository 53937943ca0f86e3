import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import Papa from 'papaparse'
import type request from 'supertest'
import { z } from 'zod'
import { db } from '#server/db/data-source'
import { AuditEntity } from '#server/modules/audit/audit.entity'
import { ReadingEntity } from '#server/modules/completions/completion.entities'
import { batches } from '#server/modules/facility/catalogues'
import { IncidentReportRowSchema, StockReportRowSchema } from '#shared/schemas/animal-report'
import { AuditRowSchema, ComplianceRowSchema, ResponseRowSchema, WelfareRowSchema } from '#shared/schemas/report'
import { TankOverviewSchema, TankReadingsSchema } from '#shared/schemas/tank-page'
import { ensureFacilityAndParameters, makeAreaWithTanks, routineInput, uniqueCode } from '#tests/support/facility-fixtures'
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

const today = () => new Date().toISOString().slice(0, 10)

describe('reports', () => {
  test('technicians are refused; supervisors, managers and observers may read', async () => {
    const q = `from=${today()}&to=${today()}`
    await (await t.signedInAgent('technician')).agent.get(`/api/reports/compliance?${q}`).expect(403)
    for (const role of ['supervisor', 'observer'] as const) await (await t.signedInAgent(role)).agent.get(`/api/reports/compliance?${q}`).expect(200)
  })

  test('a backwards or over-long date range is refused with the field named', async () => {
    const back = await manager.get('/api/reports/compliance?from=2026-05-10&to=2026-05-01').expect(400)
    expect(back.body.error.fieldErrors).toHaveProperty('to')
    await manager.get('/api/reports/welfare?from=2024-01-01&to=2026-01-01').expect(400)
    await manager.get('/api/reports/welfare?from=yesterday&to=2026-01-01').expect(400)
  })

  test('the compliance CSV parses back to the same rows as the JSON', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const task = await makeTankTask(tanks[0])
    await manager
      .post(`/api/tasks/${task.id}/completion`)
      .send(completion({ do_mgL: 6.5, temp_c: 28 }))
      .expect(200)
    const q = `from=${task.localDate}&to=${task.localDate}&by=category`
    const json = (await manager.get(`/api/reports/compliance?${q}`).expect(200)).body
    const csv = await manager.get(`/api/reports/compliance?${q}&format=csv`).expect(200)
    expect(csv.headers['content-type']).toMatch(/text\/csv/)
    const parsed = Papa.parse<Record<string, string>>(csv.text, { header: true, skipEmptyLines: true }).data
    expect(parsed.length).toBe(json.length)
    expect(parsed.map((r) => [r.period, r.group, Number(r.total), Number(r.onTime)])).toEqual(
      json.map((r: Record<string, unknown>) => [r.period, r.group, r.total, r.onTime]),
    )
  })

  test('the welfare record lists each check with its readings, who and when', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const task = await makeTankTask(tanks[0])
    const { agent, person } = await t.signedInAgent('technician')
    await agent
      .post(`/api/tasks/${task.id}/completion`)
      .send(completion({ do_mgL: 6.1, temp_c: 28.2 }))
      .expect(200)
    const { body } = await manager.get(`/api/reports/welfare?from=${task.localDate}&to=${task.localDate}&tankIds=${tanks[0].id}`).expect(200)
    expect(body).toHaveLength(1)
    expect(body[0]).toMatchObject({ status: 'done', doneBy: person.name })
    expect(body[0].readings).toContain('do_mgL=6.1 mg/L (ok)')
  })
})

describe('amendments', () => {
  test('a correction keeps the original reading and the reason, and the record shows both', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const task = await makeTankTask(tanks[0])
    const { agent } = await t.signedInAgent('technician')
    const body = completion({ do_mgL: 3.1, temp_c: 28 })
    await agent.post(`/api/tasks/${task.id}/completion`).send(body).expect(200)
    await agent
      .post(`/api/completions/${body.completionId}/amendments`)
      .send({ reason: 'x', readings: { do_mgL: 6.1 } })
      .expect(400)
    const res = await agent
      .post(`/api/completions/${body.completionId}/amendments`)
      .send({ reason: 'Typed 3.1 for 6.1; meter display read 6.1', readings: { do_mgL: 6.1 } })
      .expect(201)
    expect(res.body.reason).toMatch(/meter display/)
    const rows = await db()
      .getRepository(ReadingEntity)
      .find({ where: { completionId: body.completionId, parameterKey: 'do_mgL' }, order: { id: 'ASC' } })
    expect(rows.map((r) => [r.value, r.supersededAt !== null])).toEqual([
      [3.1, true],
      [6.1, false],
    ])
    const { body: history } = await agent.get(`/api/tasks/${task.id}/completion`).expect(200)
    expect(history.amendments[0].reason).toMatch(/meter display/)
    expect(history.readings.filter((r: { parameterKey: string }) => r.parameterKey === 'do_mgL')).toHaveLength(2)
    const someoneElse = await t.signedInAgent('technician')
    await someoneElse.agent
      .post(`/api/completions/${body.completionId}/amendments`)
      .send({ reason: 'Not mine to change', readings: { do_mgL: 7 } })
      .expect(403)
  })

  test('a paper sheet typed in later keeps the original time and person', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const task = await makeTankTask(tanks[0], { dueAt: new Date(Date.now() - 3 * 3_600_000) })
    const tech = await t.createPersonWithRole('technician')
    const { agent } = await t.signedInAgent('supervisor')
    const doneAt = new Date(Date.now() - 2.9 * 3_600_000).toISOString()
    const res = await agent
      .post(`/api/tasks/${task.id}/completion`)
      .send(completion({ do_mgL: 6, temp_c: 28 }, { doneAt, performedById: tech.id }))
      .expect(200)
    expect(res.body.task).toMatchObject({ completedById: tech.id, completedAt: doneAt })
    const techAgent = (await t.signedInAgent('technician')).agent
    const other = await makeTankTask(tanks[0])
    await techAgent
      .post(`/api/tasks/${other.id}/completion`)
      .send(completion({ do_mgL: 6, temp_c: 28 }, { performedById: tech.id }))
      .expect(403)
  })
})

describe('audit trail', () => {
  test('routine, limit, ladder, roster, assignment and person changes each leave a row with before and after', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const { body: routine } = await manager
      .post('/api/routines')
      .send(routineInput({ targetIds: [tanks[0].id] }))
      .expect(201)
    await manager
      .put(`/api/routines/${routine.id}`)
      .send({ ...routineInput({ name: routine.name, targetIds: [tanks[0].id], instructions: 'Now with a net' }), version: routine.version })
      .expect(200)
    await manager
      .put('/api/limits')
      .send({ parameterKey: 'co2_mgL', scope: 'facility', scopeId: null, okMin: 0, okMax: 14, criticalMin: null, criticalMax: 24 })
      .expect(200)
    const { body: ladder } = await manager
      .post('/api/ladders')
      .send({ name: uniqueCode('Ladder'), steps: [{ afterMinutes: 0, notify: [{ kind: 'assignee' }] }] })
      .expect(201)
    const tech = await t.createPersonWithRole('technician')
    const { body: shift } = await manager
      .post('/api/shifts')
      .send({ personId: tech.id, date: '2027-02-01', start: '07:00', end: '15:00', kind: 'day' })
      .expect(201)
    const task = await makeTankTask(tanks[0], { localDate: '2027-02-01' })
    await manager.patch(`/api/tasks/${task.id}`).send({ assigneeId: tech.id, version: task.version }).expect(200)
    await manager.patch(`/api/people/${tech.id}`).send({ title: 'Night cover' }).expect(200)
    const rows = await db()
      .getRepository(AuditEntity)
      .find({ order: { id: 'DESC' }, take: 200 })
    const find = (entity: string, id: number | string, action: string) =>
      rows.find((r) => r.entity === entity && r.entityId === String(id) && r.action === action)
    expect(find('routine', routine.id, 'create')).toBeTruthy()
    expect((find('routine', routine.id, 'update')!.after as { instructions: string }).instructions).toBe('Now with a net')
    expect(rows.find((r) => r.entity === 'limit')).toBeTruthy()
    expect(find('ladder', ladder.id, 'create')).toBeTruthy()
    expect(find('shift', shift.id, 'create')).toBeTruthy()
    expect(find('assignment', task.id, 'update')).toMatchObject({ before: { assigneeId: null }, after: { assigneeId: tech.id } })
    const personRow = find('person', tech.id, 'update')!
    expect(personRow.after).toMatchObject({ title: 'Night cover' })
    expect(JSON.stringify(personRow)).not.toContain('passwordHash')
    const me = (await manager.get('/api/me')).body
    expect(find('routine', routine.id, 'create')!.personId).toBe(me.id)
  })
})

/** The answer is exactly the shared shape: parsing keeps every field and adds none (an extra field would be stripped and differ). */
function expectExactly(schema: z.ZodType, body: unknown) {
  expect(schema.parse(body)).toEqual(body)
}

describe('the reports and the tank page answer the shapes the client parses', () => {
  test('a tank with a batch, a record and a critical check: overview, readings and every report match shared/schemas', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const tank = tanks[0]
    const batch = await batches.create({
      code: uniqueCode('B'),
      species: 'Barramundi',
      origin: 'Invented hatchery',
      arrivalDate: '2026-11-01',
      count: 300,
      meanWeightG: 4,
      tankIds: [tank.id],
      status: 'active',
      feedRatePct: 3,
    })
    const { agent } = await t.signedInAgent('technician')
    await agent.post(`/api/batches/${batch.id}/records`).send({ kind: 'note', text: 'Fish feeding well' }).expect(201)
    const task = await makeTankTask(tank)
    // 3.1 mg/L is below the demo critical minimum of 4, so the check is flagged, rechecked and escalated.
    await agent
      .post(`/api/tasks/${task.id}/completion`)
      .send(completion({ do_mgL: 3.1, temp_c: 28 }))
      .expect(200)

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
