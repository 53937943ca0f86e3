import { randomUUID } from 'node:crypto'
import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { In, type DataSource } from 'typeorm'
import { CompletionEntity } from '#server/modules/completions/completion.entities'
import {
  DB_DOWN_MESSAGE,
  DEMO,
  call,
  ensureDatabase,
  freePort,
  killDatabase,
  openDb,
  percentile,
  signIn,
  sleep,
  startApp,
  summary,
  waitFor,
  type AppProcess,
  type Reply,
} from './support/harness'
import { OK_READINGS, dayWithShifts, facilityToday, freshTanks, makeTaskPool, overdueTask, personIds, tag, taskStatus } from './support/fixtures'

let ds: DataSource
let app: AppProcess | undefined

beforeAll(async () => {
  ds = await openDb()
})
afterAll(async () => {
  await app?.kill('SIGKILL')
  await ds?.destroy()
})

const WORKERS = 12
const CLIENT_TIMEOUT_MS = 8000

interface Sample extends Reply {
  kind: 'board' | 'round' | 'completion' | 'health'
  startedAt: number
  endedAt: number
  completionId?: string
  taskId?: number
}

describe('database outage', () => {
  test('while load runs the database is SIGKILLed: requests get a quick 503 with a clear message, the app lives on, recovers within 10 s of the database, and loses nothing acknowledged', async () => {
    const people = await personIds()
    const date = await dayWithShifts([people[DEMO.priya]])
    const today = (await facilityToday()).toISODate()!
    const { ids: pool } = await makeTaskPool(1500, date, `Outage load ${tag()}`)

    app = await startApp('app', { smtpPort: await freePort(), schedulerIntervalMs: 1000 })
    const cookies = {
      supervisor: await signIn(app.url, DEMO.supervisor),
      priya: await signIn(app.url, DEMO.priya),
      observer: await signIn(app.url, DEMO.elliot),
    }

    const samples: Sample[] = []
    let next = 0
    let stop = false
    async function request(kind: Sample['kind'], path: string, opts: Parameters<typeof call>[2] = {}, extra: Partial<Sample> = {}) {
      const startedAt = Date.now()
      const reply = await call(app!.url, path, { timeoutMs: CLIENT_TIMEOUT_MS, ...opts })
      samples.push({ ...reply, kind, startedAt, endedAt: Date.now(), ...extra })
      // Like the client's query retry, back off a little after a 503 instead of hammering.
      if (reply.status === 503) await sleep(150)
    }
    async function worker(n: number) {
      while (!stop) {
        const roll = (n + next) % 10
        if (roll < 4) {
          const taskId = pool[next++ % pool.length]
          const completionId = randomUUID()
          const cookie = n % 2 ? cookies.supervisor : cookies.priya
          await request(
            'completion',
            `/api/tasks/${taskId}/completion`,
            { method: 'POST', cookie, body: { completionId, readings: OK_READINGS } },
            { completionId, taskId },
          )
        } else if (roll < 7) {
          next++
          await request('board', `/api/tasks/board?date=${today}`, { cookie: cookies.observer })
        } else {
          next++
          await request('round', '/api/tasks/round', { cookie: cookies.priya })
        }
      }
    }

    const load = Array.from({ length: WORKERS }, (_, n) => worker(n))
    await sleep(3000)
    // Enough acknowledged completions before the kill to check afterwards (a busy machine is slower).
    await waitFor(
      'completions acknowledged before the kill',
      async () => samples.filter((s) => s.kind === 'completion' && s.status === 200).length >= 20,
      20_000,
      100,
    )
    const { killedAt } = await killDatabase()
    await sleep(2000)
    // A load balancer's health check sees the outage at once (and is not left hanging either).
    const downHealth = await call(app.url, '/api/health', { timeoutMs: CLIENT_TIMEOUT_MS })
    samples.push({ ...downHealth, kind: 'health', startedAt: Date.now() - downHealth.ms, endedAt: Date.now() })
    expect(downHealth.status).toBe(503)
    expect(downHealth.body).toMatchObject({ status: 'degraded', database: 'down' })
    await sleep(4000)
    const restartStartedAt = Date.now()
    const restartMs = await ensureDatabase()
    const dbBackAt = Date.now()
    // /api/health is polled like a load balancer would, alongside the load.
    let healthyAt = 0
    while (!healthyAt && Date.now() - dbBackAt < 15_000) {
      const started = Date.now()
      const health = await call(app.url, '/api/health', { timeoutMs: CLIENT_TIMEOUT_MS })
      samples.push({ ...health, kind: 'health', startedAt: started, endedAt: Date.now() })
      if (health.status === 200) healthyAt = Date.now()
      else await sleep(100)
    }
    await sleep(3000) // load on the recovered app
    stop = true
    await Promise.all(load)

    // Not hung, not crashed, never a 500: every answer is a 2xx, an expected 4xx, or a 503 that says what is wrong.
    expect(app.alive(), app.output()).toBe(true)
    const noAnswer = samples.filter((s) => s.status === 0)
    expect(
      noAnswer.map((s) => `${s.kind} ${s.error} after ${Math.round(s.ms)} ms, at ${s.startedAt - killedAt} ms from the kill`),
      app.output(),
    ).toEqual([])
    const fiveHundreds = samples.filter((s) => s.status >= 500 && s.status !== 503)
    expect(fiveHundreds.map((s) => `${s.kind} ${s.status} ${JSON.stringify(s.body)}`)).toEqual([])
    const unavailable = samples.filter((s) => s.status === 503)
    for (const s of unavailable) {
      const message = s.kind === 'health' ? s.body?.message : s.body?.error?.message
      expect(message, `${s.kind} 503 body ${JSON.stringify(s.body)}`).toBe(s.kind === 'health' ? 'The database is not reachable.' : DB_DOWN_MESSAGE)
    }
    const unexpected = samples.filter((s) => s.status >= 400 && s.status < 500 && !(s.kind === 'completion' && (s.status === 409 || s.status === 403)))
    expect(unexpected.map((s) => `${s.kind} ${s.status} ${JSON.stringify(s.body)}`)).toEqual([])

    // While the database was away (a grace second after the kill, until it was started again) every request got 503.
    const whileDown = samples.filter((s) => s.kind !== 'health' && s.startedAt > killedAt + 1000 && s.endedAt < restartStartedAt)
    expect(whileDown.length).toBeGreaterThan(50)
    expect(whileDown.filter((s) => s.status !== 503).map((s) => `${s.kind} ${s.status}`)).toEqual([])
    expect(healthyAt, 'healthy again within 10 s of the database being back').toBeGreaterThan(0)
    expect(healthyAt - dbBackAt).toBeLessThanOrEqual(10_000)
    const afterRecovery = samples.filter((s) => s.startedAt > healthyAt && s.kind !== 'health')
    expect(afterRecovery.filter((s) => s.status < 300).length).toBeGreaterThan(0)

    // Nothing acknowledged is lost: every completion answered 2xx (before, around and after the kill) is stored.
    const completions = samples.filter((s) => s.kind === 'completion')
    const acked = completions.filter((s) => s.status === 200)
    const ackedBeforeKill = acked.filter((s) => s.endedAt < killedAt)
    expect(ackedBeforeKill.length).toBeGreaterThanOrEqual(20)
    const stored = await ds.getRepository(CompletionEntity).find({ select: { id: true, taskId: true }, where: { id: In(acked.map((s) => s.completionId!)) } })
    expect(stored.length).toBe(acked.length)
    for (const s of acked) expect(stored.find((c) => c.id === s.completionId)?.taskId).toBe(s.taskId)
    const refused = completions.filter((s) => s.status === 409 || s.status === 403)
    if (refused.length) expect(await ds.getRepository(CompletionEntity).countBy({ id: In(refused.map((s) => s.completionId!)) })).toBe(0)

    // The phone's offline queue sends an unanswered completion again with the same id: it is either
    // stored once now (200, with the task in the answer) or refused because the task is already done.
    const retried = completions.filter((s) => s.status === 503)
    const retryStatuses: Record<number, number> = {}
    // Some were stored although their answer was lost (the database died just after the commit).
    const storedUnanswered = retried.length ? await ds.getRepository(CompletionEntity).countBy({ id: In(retried.map((s) => s.completionId!)) }) : 0
    const queue = [...retried]
    const retryOne = async () => {
      for (let s = queue.shift(); s; s = queue.shift()) {
        const again = await call(app!.url, `/api/tasks/${s.taskId}/completion`, {
          method: 'POST',
          cookie: cookies.supervisor,
          body: { completionId: s.completionId, readings: OK_READINGS },
        })
        retryStatuses[again.status] = (retryStatuses[again.status] ?? 0) + 1
        expect([200, 409], JSON.stringify(again.body)).toContain(again.status)
        if (again.status === 200) expect(again.body?.task?.id, `replayed answer for ${s.completionId}`).toBe(s.taskId)
      }
    }
    await Promise.all(Array.from({ length: 6 }, retryOne))
    const perTask = (await ds.query(
      `SELECT taskId, COUNT(*) AS n FROM completions WHERE taskId IN (${pool.join(',')}) GROUP BY taskId HAVING n > 1`,
    )) as unknown[]
    expect(perTask).toEqual([])

    // The background scheduler comes back too: it holds its lock again and marks a task missed.
    const lockHolder = await waitFor(
      'the scheduler to hold its lock again',
      async () => ((await ds.query("SELECT IS_USED_LOCK('roundtide_scheduler') AS holder")) as Array<{ holder: string | null }>)[0].holder,
      10_000,
    )
    const tanks = await freshTanks(1)
    const missed = await overdueTask(tanks[0], `Outage missed ${tag()}`, people[DEMO.priya], new Date(Date.now() + 500))
    // A tick after the outage first delivers what queued up meanwhile (mail and texts, one by one),
    // so give it a few ticks' time: what is proved here is that the scheduler acts again at all.
    await waitFor('the scheduler to mark a task missed after the outage', async () => (await taskStatus(missed.id)) === 'missed', 30_000)

    const latencies = (list: Sample[]) => ({
      n: list.length,
      p50: percentile(
        list.map((s) => s.ms),
        50,
      ),
      p99: percentile(
        list.map((s) => s.ms),
        99,
      ),
      max: percentile(
        list.map((s) => s.ms),
        100,
      ),
    })
    summary('database-outage', {
      'requests (all)': samples.length,
      'status counts': samples.reduce<Record<number, number>>((acc, s) => ((acc[s.status] = (acc[s.status] ?? 0) + 1), acc), {}),
      'latency before the kill (ms)': latencies(samples.filter((s) => s.endedAt < killedAt)),
      'latency while down, all 503 (ms)': latencies(whileDown),
      'completions acknowledged (before the kill / in all)': `${ackedBeforeKill.length} / ${acked.length}, all stored`,
      'completions answered 503 / of them stored before the cut': `${retried.length} / ${storedUnanswered}`,
      'those sent again after recovery (same id), by answer': retryStatuses,
      '/api/health while down': `${downHealth.status} in ${Math.round(downHealth.ms)} ms`,
      'database restart (db.sh ensure, ms)': restartMs,
      'healthy after the database was back (ms)': healthyAt - dbBackAt,
      'scheduler lock held again by connection': lockHolder,
    })
  })
})
