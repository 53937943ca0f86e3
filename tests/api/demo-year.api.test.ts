import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { DateTime } from 'luxon'
import { createDataSource, setDataSource } from '#server/db/data-source'
import { materialise } from '#server/modules/scheduling/materialiser'
import type { DataSource } from 'typeorm'
import { seedDemo } from '#seed/seed-demo'
import { testConfig } from '#tests/support/test-app'

// The demo facility in a database of its own, so its fixed codes never meet other tests' rows.
let ds: DataSource
beforeAll(async () => {
  const base = testConfig().db
  const admin = createDataSource(base)
  await admin.initialize()
  const name = `${base.database}_demo`
  await admin.query(`DROP DATABASE IF EXISTS \`${name}\``)
  await admin.query(`CREATE DATABASE \`${name}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`)
  await admin.destroy()
  ds = createDataSource({ ...base, database: name })
  await ds.initialize()
  await ds.runMigrations()
  setDataSource(ds)
}, 120_000)
afterAll(() => ds?.destroy())

describe('demo facility', () => {
  test('when the demo is seeded on any date, then today has tasks, starting with the morning round', async () => {
    await seedDemo('tidepool-demo', () => undefined)
    const today = DateTime.now().setZone('Australia/Brisbane').toISODate()
    const [{ n, first }] = await ds.query('SELECT COUNT(*) AS n, MIN(localStart) AS first FROM tasks WHERE localDate = ?', [today])
    expect(Number(n)).toBeGreaterThan(50)
    expect(first).toBe(`${today}T07:30:00`)
    // The demo's stock register holds what its batches say they hold.
    const batches: Array<{ id: number; count: number }> = await ds.query('SELECT id, count FROM batches')
    for (const b of batches) {
      const [{ held }] = await ds.query(
        "SELECT COALESCE(SUM(CASE WHEN kind IN ('arrival', 'correction') THEN count WHEN kind IN ('transfer', 'grading') THEN 0 ELSE -count END), 0) AS held FROM stock_movements WHERE batchId = ?",
        [b.id],
      )
      expect(Number(held)).toBe(b.count)
    }
  }, 120_000)

  test('when a year of horizon is materialised, then it finishes, reports progress and its count, and a rerun adds nothing', async () => {
    const progress: number[] = []
    const start = DateTime.now().setZone('Australia/Brisbane').startOf('day').toJSDate()
    const { created, routines } = await materialise({ from: start, horizonDays: 365, onProgress: (done) => progress.push(done) })
    expect(routines).toBe(21)
    expect(progress).toEqual(Array.from({ length: 21 }, (_, i) => i + 1))
    const [{ n }] = await ds.query('SELECT COUNT(*) AS n FROM tasks')
    // Counted by hand: the morning check covers 20 tanks in use (holding tank 3 is empty), once a day.
    const today = DateTime.now().setZone('Australia/Brisbane').toISODate()
    const [{ morning }] = await ds.query("SELECT COUNT(*) AS morning FROM tasks WHERE title = 'Morning tank check' AND localDate >= ?", [today])
    expect(Number(morning)).toBe(20 * 365)
    // The daily routines alone make 36,500 a year (7300 + 7300 + 1460 + 8760 + 8760 + 1460 + 1095 + 365).
    expect(Number(n)).toBeGreaterThan(36_500)
    expect(created).toBeGreaterThan(0)
    console.log(`Demo facility, 365-day horizon: ${n} tasks in all (${created} added beyond the first 42 days)`)
    expect((await materialise({ from: start, horizonDays: 365 })).created).toBe(0)
  }, 120_000)
})
