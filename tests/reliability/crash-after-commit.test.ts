import { randomUUID } from 'node:crypto'
import { io, type Socket } from 'socket.io-client'
import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { In, IsNull, type DataSource } from 'typeorm'
import { AuditEntity } from '#server/modules/audit/audit.entity'
import { AlertEntity, CompletionEntity } from '#server/modules/completions/completion.entities'
import { TaskEntity } from '#server/modules/tasks/task.entity'
import { ChangeOutboxEntity } from '#server/realtime/change-outbox.entity'
import { LIVE_EVENTS, type TasksUpdatedEvent } from '#shared/schemas/live'
import { makeTankTask } from '#tests/support/task-fixtures'
import { DEMO, call, freePort, openDb, signIn, sleep, startApp, summary, waitFor, type AppProcess } from './support/harness'
import { freshTanks, personIds, tag } from './support/fixtures'

let ds: DataSource
let smtpPort: number
const apps: AppProcess[] = []
const sockets: Socket[] = []

beforeAll(async () => {
  ds = await openDb()
  smtpPort = await freePort()
})
afterAll(async () => {
  for (const s of sockets) s.close()
  for (const app of apps) await app.kill('SIGKILL')
  await ds?.destroy()
})

// The first publisher pass comes one interval after start: long enough for the test's socket to connect.
const PUBLISH_MS = 5000
/** The claim lease of server/realtime/publisher.ts, after which another process sends claimed rows. */
const CLAIM_LEASE_MS = 15_000

/** Every task each `tasks:updated` batch carried, in order of arrival. */
function listen(url: string, cookie: string) {
  const socket = io(url, { extraHeaders: { cookie }, reconnection: false, forceNew: true })
  sockets.push(socket)
  const seen: number[] = []
  socket.on(LIVE_EVENTS.tasksUpdated, ({ tasks }: TasksUpdatedEvent) => seen.push(...tasks.map((t) => t.id)))
  const ready = new Promise<void>((resolve, reject) => {
    socket.once('connect', () => resolve())
    socket.once('connect_error', reject)
  })
  return { seen, ready, times: (id: number) => seen.filter((x) => x === id).length }
}

const outboxRows = (taskIds: number[]) => ds.getRepository(ChangeOutboxEntity).findBy({ kind: 'task', entityId: In(taskIds.map(String)) })

/** Nothing earlier (the seed's planning, other tests) waits in the outbox: this test's rows are the only ones. */
const settleOutbox = () => ds.getRepository(ChangeOutboxEntity).update({ publishedAt: IsNull() }, { publishedAt: new Date() })

describe('a crash after the commit', () => {
  test('killed right after a flagged completion committed: its recheck, alert, audit row and outbox rows are there, and the restarted app sends the live event once', async () => {
    await settleOutbox()
    const priya = (await personIds())[DEMO.priya]
    const [tank] = await freshTanks(1)
    const task = await makeTankTask(tank, { title: `Crash after commit ${tag()}`, assigneeId: priya, status: 'open' })
    const env = { ROUNDTIDE_CRASH_AT: `after-commit /api/tasks/${task.id}/completion$`, ROUNDTIDE_PUBLISH_INTERVAL_MS: String(PUBLISH_MS) }
    const first = await startApp('app (crashes after the commit)', { smtpPort, env })
    apps.push(first)
    const cookie = await signIn(first.url, DEMO.priya)

    const completionId = randomUUID()
    const answer = await call(first.url, `/api/tasks/${task.id}/completion`, {
      method: 'POST',
      cookie,
      body: { completionId, readings: { do_mgL: 3.1, temp_c: 28 } },
    })
    expect(answer.status, 'no answer: the process died before responding').toBe(0)
    await waitFor('the first process to be gone', async () => !first.alive(), 10_000, 50)

    // Everything of the completion committed together.
    const done = await ds.getRepository(TaskEntity).findOneByOrFail({ id: task.id })
    expect(done).toMatchObject({ status: 'done', flag: 'critical', completedById: priya })
    const recheck = await ds.getRepository(TaskEntity).findOneByOrFail({ recheckOfTaskId: task.id })
    expect(await ds.getRepository(AlertEntity).countBy({ taskId: task.id, kind: 'critical_reading' })).toBe(1)
    expect(await ds.getRepository(AuditEntity).countBy({ entity: 'completion', entityId: completionId })).toBe(1)
    expect((await ds.getRepository(CompletionEntity).findOneByOrFail({ id: completionId })).response).toMatchObject({ recheckTaskId: recheck.id })
    const pending = await outboxRows([task.id, recheck.id])
    expect(pending.map((r) => [Number(r.entityId), r.publishedAt])).toEqual(
      expect.arrayContaining([
        [task.id, null],
        [recheck.id, null],
      ]),
    )

    // The restarted process sends what the killed one committed but never published, once.
    const second = await startApp('app (after the crash)', { smtpPort, env: { ROUNDTIDE_PUBLISH_INTERVAL_MS: String(PUBLISH_MS) } })
    apps.push(second)
    const restartedAt = Date.now()
    const feed = listen(second.url, cookie)
    await feed.ready
    await waitFor('the completed task and its recheck on the live feed', async () => feed.times(task.id) > 0 && feed.times(recheck.id) > 0, 15_000, 50)
    const deliveredMs = Date.now() - restartedAt
    await sleep(3 * PUBLISH_MS) // several more passes: nothing is sent again
    expect(feed.times(task.id)).toBe(1)
    expect(feed.times(recheck.id)).toBe(1)
    expect((await outboxRows([task.id, recheck.id])).every((r) => r.publishedAt !== null)).toBe(true)
    await second.kill('SIGKILL')

    summary('crash after commit', {
      'completion answered': `status ${answer.status} (${answer.error ?? 'answer'})`,
      'kept after the crash': 'task done + recheck + critical alert + audit row + stored answer + 2 outbox rows',
      'restart → event on the live feed (ms)': deliveredMs,
      'times sent (task, recheck)': [feed.times(task.id), feed.times(recheck.id)],
    })
  })

  test('killed between claiming the outbox rows and sending them: another process sends them after the claim lapses, once', async () => {
    await settleOutbox()
    const priya = (await personIds())[DEMO.priya]
    const [tank] = await freshTanks(1)
    const task = await makeTankTask(tank, { title: `Crash after claim ${tag()}`, assigneeId: priya, status: 'open' })
    const env = { ROUNDTIDE_CRASH_AT: `after-claim task:${task.id}\\b`, ROUNDTIDE_PUBLISH_INTERVAL_MS: '300' }
    const first = await startApp('app (crashes after claiming)', { smtpPort, env })
    apps.push(first)
    const cookie = await signIn(first.url, DEMO.priya)
    await sleep(1000) // its publisher is past its first pass: the completion's commit is published at once

    const completionId = randomUUID()
    const answer = await call(first.url, `/api/tasks/${task.id}/completion`, {
      method: 'POST',
      cookie,
      body: { completionId, readings: { do_mgL: 6.8, temp_c: 28.2 } },
    })
    // The publisher claims right after the commit, off the response path, so the process may die
    // before or after its answer leaves: either way the completion is stored (a phone would retry).
    expect([0, 200]).toContain(answer.status)
    expect(await ds.getRepository(CompletionEntity).countBy({ id: completionId })).toBe(1)
    await waitFor('the first process to die after claiming', async () => !first.alive(), 10_000, 50)
    const [claimed] = await outboxRows([task.id])
    expect(claimed).toMatchObject({ publishedAt: null, claimedBy: expect.any(String) })

    const second = await startApp('app (after the crash)', { smtpPort, env: { ROUNDTIDE_PUBLISH_INTERVAL_MS: String(PUBLISH_MS) } })
    apps.push(second)
    const feed = listen(second.url, cookie)
    await feed.ready
    await waitFor('the task on the live feed once the claim lapsed', async () => feed.times(task.id) > 0, CLAIM_LEASE_MS + 15_000, 100)
    const sentAfterClaimMs = Date.now() - claimed.claimedAt!.getTime()
    expect(sentAfterClaimMs).toBeGreaterThanOrEqual(CLAIM_LEASE_MS - 1000)
    await sleep(3000)
    expect(feed.times(task.id)).toBe(1)
    const [published] = await outboxRows([task.id])
    expect(published.publishedAt).not.toBeNull()
    expect(published.claimedBy).not.toBe(claimed.claimedBy)
    await second.kill('SIGKILL')

    summary('crash after claim', { 'claimed → sent by the restarted process (ms)': sentAfterClaimMs, 'times sent': feed.times(task.id) })
  })
})
