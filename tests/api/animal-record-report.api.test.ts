import Papa from 'papaparse'
import { DateTime } from 'luxon'
import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { createDataSource } from '#server/db/data-source'
import { seedDemo } from '#seed/seed-demo'
import { IncidentReportRowSchema, StockReportRowSchema, type IncidentReportRow, type StockReportRow } from '#shared/schemas/animal-report'
import type { BatchStock, Movement } from '#shared/schemas/stock'
import { startTestApp, testConfig, type TestApp } from '#tests/support/test-app'

// The demo facility in a database of its own, as tests/api/demo-year.api.test.ts seeds it.
let t: TestApp
let manager: Awaited<ReturnType<TestApp['signedInAgent']>>['agent']
const today = DateTime.now().setZone('Australia/Brisbane')
const yearAgo = today.minus({ days: 364 }).toISODate()!
beforeAll(async () => {
  const base = testConfig().db
  const name = `${base.database}_record`
  const admin = createDataSource(base)
  await admin.initialize()
  await admin.query(`DROP DATABASE IF EXISTS \`${name}\``)
  await admin.query(`CREATE DATABASE \`${name}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`)
  await admin.destroy()
  const migrating = createDataSource({ ...base, database: name })
  await migrating.initialize()
  await migrating.runMigrations()
  await migrating.destroy()
  t = await startTestApp({ db: { ...base, database: name } })
  await seedDemo('tidepool-demo', () => undefined)
  manager = (await t.signedInAgent('manager')).agent
}, 180_000)
afterAll(() => t?.close())

const NUMBERS = ['opening', 'arrived', 'movedIn', 'movedOut', 'died', 'culled', 'used', 'dispatched', 'corrected', 'closing'] as const
const stock = async (from: string, to: string, extra = '') =>
  StockReportRowSchema.array().parse((await manager.get(`/api/reports/stock?from=${from}&to=${to}${extra}`).expect(200)).body)

describe('the animal record for a committee, on the demo year', () => {
  test('when a manager asks for the year, then every batch balances: opening + in − out = closing, moves between tanks cancel, and the end is what the register holds', async () => {
    const rows = await stock(yearAgo, today.toISODate()!)
    const batchLines = rows.filter((r) => r.tankId === null)
    expect(batchLines.map((r) => r.batchCode).sort()).toEqual(['B-NUR-APR', 'B-QUA-NEW', 'B-SPR-25', 'B-TRIAL'])
    for (const b of batchLines) {
      expect(b.balanced, b.batchCode).toBe(true)
      expect(b.opening + b.arrived - b.died - b.culled - b.used - b.dispatched + b.corrected).toBe(b.closing)
      expect(b.movedIn).toBe(b.movedOut)
      const tanks = rows.filter((r) => r.batchId === b.batchId && r.tankId !== null)
      for (const key of NUMBERS)
        expect(
          tanks.reduce((s, r) => s + r[key], 0),
          `${b.batchCode} ${key}`,
        ).toBe(b[key])
      for (const line of tanks)
        expect(line.opening + line.arrived + line.movedIn - line.movedOut - line.died - line.culled - line.used - line.dispatched + line.corrected).toBe(
          line.closing,
        )
      // The register's own count for the batch, read another way.
      const now = (await manager.get(`/api/batches/${b.batchId}/stock`).expect(200)).body as BatchStock
      expect(b.closing).toBe(now.count)
    }
    // Every batch arrived inside the year, so nothing is carried in.
    expect(batchLines.every((b) => b.opening === 0)).toBe(true)
    const spring = batchLines.find((b) => b.batchCode === 'B-SPR-25')!
    expect(spring).toMatchObject({ arrived: 4800, culled: 40, used: 30, closing: 0 })
    expect(spring.dispatched).toBe(4800 - spring.died - 40 - 30)
    const nursery = batchLines.find((b) => b.batchCode === 'B-NUR-APR')!
    expect(nursery.diedByCause).toMatch(/^Water quality \d+/)
    expect(nursery.movedIn).toBeGreaterThan(0)
  })

  test('when the year is cut in two, then the first half closes on what the second half opens with', async () => {
    const middle = today.minus({ days: 182 })
    const first = await stock(yearAgo, middle.toISODate()!)
    const second = await stock(middle.plus({ days: 1 }).toISODate()!, today.toISODate()!)
    const closing = new Map(first.map((r) => [`${r.batchId}:${r.tankId}`, r.closing]))
    for (const r of second) expect(r.opening, `${r.batchCode} ${r.tank}`).toBe(closing.get(`${r.batchId}:${r.tankId}`) ?? 0)
    expect(second.find((r) => r.batchCode === 'B-SPR-25' && r.tankId === null)).toMatchObject({ closing: 0, balanced: true })
    expect([...first, ...second].every((r) => r.balanced)).toBe(true)
  })

  test('one batch on its own, with its arrivals carrying origin, permit and transport water', async () => {
    const all = await stock(yearAgo, today.toISODate()!)
    const trial = all.find((r) => r.batchCode === 'B-TRIAL')!
    const rows = await stock(yearAgo, today.toISODate()!, `&batchId=${trial.batchId}`)
    expect(new Set(rows.map((r) => r.batchCode))).toEqual(new Set(['B-TRIAL']))
    expect(rows.find((r) => r.tankId === null)).toEqual(trial)
    const movements = (await manager.get(`/api/stock/movements?batchId=${trial.batchId}`).expect(200)).body as Movement[]
    const arrival = movements.find((m) => m.kind === 'arrival')!
    expect(arrival).toMatchObject({ origin: 'Quollridge Fingerlings (invented)', permitRef: expect.any(String), healthCertificateRef: expect.any(String) })
    expect(arrival.transportWater).toMatchObject({ tempC: expect.any(Number), pH: expect.any(Number), doMgL: expect.any(Number) })
  })

  test('the stock CSV parses back to the same rows', async () => {
    const rows = await stock(yearAgo, today.toISODate()!)
    const res = await manager.get(`/api/reports/stock?from=${yearAgo}&to=${today.toISODate()}&format=csv`).expect(200)
    expect(res.headers['content-type']).toContain('text/csv')
    const parsed = Papa.parse<Record<string, unknown>>(res.text, { header: true, dynamicTyping: true, skipEmptyLines: true })
    expect(parsed.errors).toEqual([])
    // An empty cell is the null tank of a batch's own line.
    expect(parsed.data.map((r) => StockReportRowSchema.parse({ ...r, diedByCause: r.diedByCause ?? '' }))).toEqual(rows satisfies StockReportRow[])
  })

  test('the incident list shows each deadline met or missed: one incident reported on time, one late; its CSV parses back to the same rows', async () => {
    const res = await manager.get(`/api/reports/incidents?from=${yearAgo}&to=${today.toISODate()}`).expect(200)
    const rows = IncidentReportRowSchema.array().parse(res.body)
    expect(rows).toHaveLength(2)
    const [nursery, trial] = rows
    expect(nursery).toMatchObject({ welfare: 'met', committee: 'met', report: 'met', status: 'closed' })
    expect(trial).toMatchObject({ welfare: 'met', committee: 'late', report: 'late', status: 'closed' })
    expect(trial.committeeDoneAt > trial.committeeDueAt).toBe(true)
    const csv = await manager.get(`/api/reports/incidents?from=${yearAgo}&to=${today.toISODate()}&format=csv`).expect(200)
    // Dates stay text; numbers become numbers again.
    const parsed = Papa.parse<Record<string, unknown>>(csv.text, {
      header: true,
      dynamicTyping: (field) => field === 'id' || field === 'affected' || field === 'dead',
      skipEmptyLines: true,
    })
    expect(parsed.data.map((r) => IncidentReportRowSchema.parse(r))).toEqual(rows satisfies IncidentReportRow[])
  })

  test('a technician may not read the committee report', async () => {
    const { agent } = await t.signedInAgent('technician')
    await agent.get(`/api/reports/stock?from=${yearAgo}&to=${today.toISODate()}`).expect(403)
  })
})
