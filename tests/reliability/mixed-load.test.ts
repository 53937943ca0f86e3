import { randomUUID } from 'node:crypto'
import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { In, type DataSource } from 'typeorm'
import { CompletionEntity, ReadingEntity } from '#server/modules/completions/completion.entities'
import { TaskEntity } from '#server/modules/tasks/task.entity'
import { DEMO, call, freePort, openDb, signIn, startApp, summary, type AppProcess } from './support/harness'
import { OK_READINGS, dayWithShifts, facilityToday, makeTaskPool, personIds, tag } from './support/fixtures'
import { autocannon, pick, type CannonResult } from './support/load'

let ds: DataSource
let app: AppProcess | undefined

beforeAll(async () => {
  ds = await openDb()
})
afterAll(async () => {
  await app?.kill('SIGKILL')
  await ds?.destroy()
})

const SECONDS = Number(process.env.RELIABILITY_LOAD_SECONDS ?? 60)
const POOL = 6000
/** A request unanswered this long counts as hung (generous: a loaded 2-core machine is slow, not stuck). */
const CLIENT_TIMEOUT_S = 30
const CONNECTIONS = { board: 20, round: 15, completion: 30, assignment: 10 }
type Kind = keyof typeof CONNECTIONS

const chunks = <T>(list: T[], size = 1000) => Array.from({ length: Math.ceil(list.length / size) }, (_, i) => list.slice(i * size, (i + 1) * size))

describe('mixed load', () => {
  test(`${SECONDS} s of board and round reads, completions and assignments at ${Object.values(CONNECTIONS).reduce((a, b) => a + b)} connections: no 5xx, and every acknowledged completion is stored exactly once`, async () => {
    const people = await personIds()
    const techs = [people[DEMO.priya], people[DEMO.josh]]
    const poolDate = await dayWithShifts(techs)
    const today = await facilityToday()
    const days = [today.toISODate()!, today.plus({ days: 1 }).toISODate()!]
    const { ids: pool } = await makeTaskPool(POOL, poolDate, `Load check ${tag()}`)
    expect(pool).toHaveLength(POOL)
    expect(days).not.toContain(poolDate)

    app = await startApp('app', { smtpPort: await freePort(), schedulerIntervalMs: 5000 })
    const cookies: Record<string, string> = {}
    for (const email of Object.values(DEMO)) cookies[email] = await signIn(app.url, email)
    const as = (...emails: string[]) => emails.map((e) => cookies[e])
    const readers = as(DEMO.elliot, DEMO.ruth, DEMO.manager, DEMO.supervisor)
    const walkers = as(DEMO.priya, DEMO.josh, DEMO.ana, DEMO.sione)
    const completers = as(DEMO.priya, DEMO.josh, DEMO.supervisor, DEMO.manager)
    const planners = as(DEMO.supervisor, DEMO.manager)

    const statuses: Record<Kind, Record<number, number>> = { board: {}, round: {}, completion: {}, assignment: {} }
    const count = (kind: Kind, status: number) => (statuses[kind][status] = (statuses[kind][status] ?? 0) + 1)
    const acked = new Map<string, { taskId: number; readings: number }>()
    const ackedList: Array<{ completionId: string; taskId: number }> = []
    const refused: string[] = []
    const replays = { sent: 0, ok: 0, wrong: [] as string[] }
    const versions = new Map<number, number>()
    const recent: number[] = []
    let cursor = 0
    const json = { 'content-type': 'application/json' }

    type Pick = { completionId: string; taskId: number; replay: boolean }
    const nextCompletion = (): Pick => {
      const roll = Math.random()
      // The phone's offline queue sending an acknowledged completion again: answered 200 from the record.
      if (roll < 0.05 && ackedList.length) return { ...pick(ackedList), replay: true }
      // Two people on the same task at once: one wins, the other gets 409.
      if (roll < 0.2 && recent.length) return { completionId: randomUUID(), taskId: pick(recent), replay: false }
      const taskId = pool[cursor++ % pool.length]
      recent.push(taskId)
      if (recent.length > 60) recent.shift()
      return { completionId: randomUUID(), taskId, replay: false }
    }

    const started = Date.now()
    const failures: Record<string, number> = {}
    const run = (kind: Kind, request: Parameters<typeof autocannon>[0]['requests'][number]) => {
      const instance = autocannon({ url: app!.url, connections: CONNECTIONS[kind], duration: SECONDS, timeout: CLIENT_TIMEOUT_S, requests: [request] })
      instance.on('reqError', (error) => {
        const key = `${kind}: ${error.message} at ${((Date.now() - started) / 1000).toFixed(1)} s`
        failures[key] = (failures[key] ?? 0) + 1
      })
      return instance
    }

    const [board, round, completion, assignment] = (await Promise.all([
      run('board', {
        method: 'GET',
        setupRequest: (req) => ({ ...req, method: 'GET', path: `/api/tasks/board?date=${pick(days)}`, headers: { cookie: pick(readers) } }),
        onResponse: (status) => count('board', status),
      }),
      run('round', {
        method: 'GET',
        setupRequest: (req) => ({ ...req, method: 'GET', path: '/api/tasks/round', headers: { cookie: pick(walkers) } }),
        onResponse: (status) => count('round', status),
      }),
      run('completion', {
        method: 'POST',
        setupRequest: (req, context) => {
          const chosen = nextCompletion()
          context.pick = chosen
          return {
            ...req,
            method: 'POST',
            path: `/api/tasks/${chosen.taskId}/completion`,
            headers: { ...json, cookie: pick(completers) },
            body: JSON.stringify({ completionId: chosen.completionId, readings: OK_READINGS }),
          }
        },
        onResponse: (status, body, context) => {
          count('completion', status)
          const chosen = context.pick as Pick
          if (chosen.replay) {
            replays.sent++
            if (status === 200 && JSON.parse(body)?.task?.id === chosen.taskId) replays.ok++
            else replays.wrong.push(`${status} ${body.slice(0, 200)}`)
          } else if (status >= 200 && status < 300) {
            const result = JSON.parse(body) as { task: { version: number }; readings: unknown[] }
            acked.set(chosen.completionId, { taskId: chosen.taskId, readings: result.readings.length })
            ackedList.push({ completionId: chosen.completionId, taskId: chosen.taskId })
            versions.set(chosen.taskId, result.task.version)
          } else {
            refused.push(chosen.completionId)
          }
        },
      }),
      run('assignment', {
        method: 'PATCH',
        setupRequest: (req, context) => {
          // Supervisors drag cards a little ahead of where the technicians are working.
          const taskId = pool[(cursor + 20 + Math.floor(Math.random() * 600)) % pool.length]
          context.taskId = taskId
          return {
            ...req,
            method: 'PATCH',
            path: `/api/tasks/${taskId}`,
            headers: { ...json, cookie: pick(planners) },
            body: JSON.stringify({ version: versions.get(taskId) ?? 1, assigneeId: pick([...techs, null]) }),
          }
        },
        onResponse: (status, body, context) => {
          count('assignment', status)
          const taskId = context.taskId as number
          const parsed = body ? (JSON.parse(body) as { version?: number; error?: { details?: { currentVersion?: number } } }) : {}
          const version = status === 200 ? parsed.version : parsed.error?.details?.currentVersion
          if (version) versions.set(taskId, version)
        },
      }),
    ])) as CannonResult[]
    const elapsedS = (Date.now() - started) / 1000

    const results: Record<Kind, CannonResult> = { board, round, completion, assignment }

    // The app stayed up and answered everything, never with a 5xx, never too slowly.
    expect(app.alive(), app.output()).toBe(true)
    expect((await call(app.url, '/api/health')).status).toBe(200)
    for (const [kind, result] of Object.entries(results)) {
      expect(result.errors, `${kind}: connection errors ${JSON.stringify(failures)}`).toBe(0)
      expect(result.timeouts, `${kind}: timeouts`).toBe(0)
      expect(result['5xx'], `${kind}: 5xx answers ${JSON.stringify(statuses[kind as Kind])}`).toBe(0)
    }
    expect(Object.keys(statuses.board)).toEqual(['200'])
    expect(Object.keys(statuses.round)).toEqual(['200'])
    for (const s of Object.keys(statuses.completion)) expect(['200', '403', '409']).toContain(s)
    for (const s of Object.keys(statuses.assignment)) expect(['200', '409']).toContain(s)
    expect(statuses.assignment[200] ?? 0).toBeGreaterThan(0)
    expect(replays.wrong).toEqual([])

    // Every acknowledged completion is in the database once, with exactly the readings its answer listed.
    expect(acked.size).toBeGreaterThan(100)
    const ackedIds = [...acked.keys()]
    let stored = 0
    for (const ids of chunks(ackedIds)) {
      const rows = await ds.getRepository(CompletionEntity).find({ select: { id: true, taskId: true }, where: { id: In(ids) } })
      stored += rows.length
      for (const row of rows) expect(row.taskId).toBe(acked.get(row.id)!.taskId)
      const readings = (await ds
        .getRepository(ReadingEntity)
        .createQueryBuilder('r')
        .select('r.completionId', 'id')
        .addSelect('COUNT(*)', 'n')
        .where({ completionId: In(ids) })
        .groupBy('r.completionId')
        .getRawMany()) as Array<{ id: string; n: string }>
      for (const r of readings) expect(Number(r.n), `readings of ${r.id}`).toBe(acked.get(r.id)!.readings)
      expect(readings.length).toBe(ids.length)
    }
    expect(stored).toBe(acked.size)
    // A refused completion left nothing behind.
    let leaked = 0
    for (const ids of chunks(refused)) leaked += await ds.getRepository(CompletionEntity).countBy({ id: In(ids) })
    expect(leaked).toBe(0)
    // No task was completed twice, and every finished task of the pool is accounted for: acknowledged,
    // or still in flight when the load stopped (at most one per connection).
    const doubles = await ds.query(`SELECT taskId, COUNT(*) AS n FROM completions WHERE taskId IN (${pool.join(',')}) GROUP BY taskId HAVING n > 1`)
    expect(doubles).toEqual([])
    const done = await ds.getRepository(TaskEntity).countBy({ id: In(pool), status: 'done' })
    const ackedTasks = new Set([...acked.values()].map((a) => a.taskId)).size
    expect(ackedTasks).toBe(acked.size)
    expect(done - ackedTasks).toBeGreaterThanOrEqual(0)
    expect(done - ackedTasks).toBeLessThanOrEqual(CONNECTIONS.completion)

    const line = (kind: Kind) => {
      const r = results[kind]
      return `${r.requests.total} requests (${Math.round(r.requests.average)}/s), 2xx latency p50 ${r.latency.p50} ms, p97.5 ${r.latency.p97_5} ms, p99 ${r.latency.p99} ms, max ${r.latency.max} ms; statuses ${JSON.stringify(statuses[kind])}`
    }
    summary('mixed-load', {
      duration: `${elapsedS.toFixed(1)} s at ${Object.values(CONNECTIONS).reduce((a, b) => a + b)} connections (${JSON.stringify(CONNECTIONS)})`,
      'board reads': line('board'),
      'round reads': line('round'),
      completions: line('completion'),
      assignments: line('assignment'),
      'completions acknowledged / stored exactly once': `${acked.size} / ${stored}`,
      'refused completions (403/409), none stored': refused.length,
      'replays of acknowledged completions answered 200': `${replays.ok} / ${replays.sent}`,
      'pool tasks done (acknowledged + in flight at the end)': `${done} (${ackedTasks} + ${done - ackedTasks})`,
      'errors / timeouts / 5xx': Object.values(results).reduce((sum, r) => sum + r.errors + r.timeouts + r['5xx'], 0),
    })
  })
})
