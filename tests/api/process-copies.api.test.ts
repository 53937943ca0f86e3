import { afterAll, afterEach, beforeAll, describe, expect, test, vi } from 'vitest'
import { CACHE_MAX_AGE_MS } from '#server/db/cached-read'
import { db } from '#server/db/data-source'
import { ensureFacilityAndParameters, makeAreaWithTanks, uniqueCode } from '#tests/support/facility-fixtures'
import { completion, makeTankTask, setSystemLimit } from '#tests/support/task-fixtures'
import { startTestApp, type TestApp } from '#tests/support/test-app'

// The completion path judges readings from per-process copies of the catalogue, parameters and
// limits (record 16e). Raw SQL below stands for a write made by another app process, which this
// process's TypeORM never sees.
let t: TestApp
beforeAll(async () => {
  t = await startTestApp()
  await ensureFacilityAndParameters()
})
afterAll(() => t.close())
afterEach(() => vi.useRealTimers())

const salinityCheck = async (agent: Awaited<ReturnType<TestApp['signedInAgent']>>['agent'], tank: Parameters<typeof makeTankTask>[0]) => {
  const task = await makeTankTask(tank, { requiredReadings: ['salinity'] })
  const res = await agent
    .post(`/api/tasks/${task.id}/completion`)
    .send(completion({ salinity: 12.5 }))
    .expect(200)
  return res.body.task.flag as string | null
}

describe('rules and names come from copies kept per process', () => {
  test('when a limit is changed in this process, then the very next completion is judged by it', async () => {
    const { system, tanks } = await makeAreaWithTanks(2)
    const { agent } = await t.signedInAgent('supervisor')
    expect(await salinityCheck(agent, tanks[0])).toBeNull()
    await setSystemLimit(system.id, 'salinity', { okMin: 14, okMax: 16, criticalMin: 11, criticalMax: 19 })
    expect(await salinityCheck(agent, tanks[1])).toBe('watch')
  })

  test('when another process changes a limit, then completions are judged by it once the copy has aged out', async () => {
    const { system, tanks } = await makeAreaWithTanks(2)
    const { agent } = await t.signedInAgent('supervisor')
    expect(await salinityCheck(agent, tanks[0])).toBeNull()
    await db().query(
      "INSERT INTO limits (parameterKey, scope, scopeId, okMin, okMax, criticalMin, criticalMax) VALUES ('salinity', 'system', ?, 14, 16, 11, 19)",
      [system.id],
    )
    vi.useFakeTimers({ toFake: ['Date'], now: Date.now() + CACHE_MAX_AGE_MS + 1 })
    expect(await salinityCheck(agent, tanks[1])).toBe('watch')
  })

  test('when another process adds a tank in a system with its own limits, then its first completion is judged there', async () => {
    const { system, tanks } = await makeAreaWithTanks(1)
    await setSystemLimit(system.id, 'salinity', { okMin: 14, okMax: 16, criticalMin: 11, criticalMax: 19 })
    const { agent } = await t.signedInAgent('supervisor')
    expect(await salinityCheck(agent, tanks[0])).toBe('watch')
    const code = uniqueCode('T')
    await db().query("INSERT INTO tanks (code, name, areaId, systemId, volumeL, kind, inUse) VALUES (?, 'Made elsewhere', ?, ?, 800, 'tank', 1)", [
      code,
      tanks[0].areaId,
      system.id,
    ])
    const [made] = (await db().query('SELECT * FROM tanks WHERE code = ?', [code])) as Array<(typeof tanks)[0]>
    // The copy may be fresh; a lookup that misses reloads it once it is a moment old.
    vi.useFakeTimers({ toFake: ['Date'], now: Date.now() + 300 })
    expect(await salinityCheck(agent, { ...made, id: Number(made.id) })).toBe('watch')
  })
})
