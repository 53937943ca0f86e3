import { randomUUID } from 'node:crypto'
import { io, type Socket } from 'socket.io-client'
import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import type { DataSource } from 'typeorm'
import { startLocalSmtp } from '#server/mail/local-smtp'
import { LIVE_EVENTS, type TasksUpdatedEvent } from '#shared/schemas/live'
import type { Task } from '#shared/schemas/task'
import { makeTankTask } from '#tests/support/task-fixtures'
import { DEMO, call, freePort, openDb, schedulerLeader, signIn, sleep, startApp, startRedis, summary, waitFor, type AppProcess } from './support/harness'
import { OK_READINGS, deliveryTally, freshTanks, mailsFor, notificationsFor, overdueTask, personIds, tag, taskStatus } from './support/fixtures'

let ds: DataSource
let redis: Awaited<ReturnType<typeof startRedis>> | undefined
let catcher: Awaited<ReturnType<typeof startLocalSmtp>> | undefined
const apps: AppProcess[] = []
const sockets: Socket[] = []

beforeAll(async () => {
  ds = await openDb()
  redis = await startRedis()
})
afterAll(async () => {
  sockets.forEach((s) => s.close())
  for (const app of apps) await app.kill('SIGKILL')
  await catcher?.close()
  await redis?.stop()
  await ds?.destroy()
})

const TICK_MS = 500

function connect(url: string, cookie: string, transports?: Array<'polling' | 'websocket'>) {
  const socket = io(url, { extraHeaders: { cookie }, reconnection: false, forceNew: true, ...(transports ? { transports } : {}) })
  sockets.push(socket)
  return new Promise<Socket>((resolve, reject) => {
    socket.once('connect', () => resolve(socket))
    socket.once('connect_error', reject)
  })
}

function nextTask(socket: Socket, id: number, ms = 5000) {
  return new Promise<Task>((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`no ${LIVE_EVENTS.tasksUpdated} for task ${id} within ${ms} ms`)), ms)
    socket.on(LIVE_EVENTS.tasksUpdated, ({ tasks }: TasksUpdatedEvent) => {
      const task = tasks.find((t) => t.id === id)
      if (!task) return
      clearTimeout(timer)
      resolve(task)
    })
  })
}

const mailedOnce = async (task: { id: number; title: string }) => {
  const rows = await notificationsFor(task.id)
  return (await taskStatus(task.id)) === 'missed' && rows.length > 0 && rows.every((n) => n.status === 'sent') && (await mailsFor(task.title)).length > 0
}

function expectExactlyOnce(name: string, tally: Awaited<ReturnType<typeof deliveryTally>>) {
  expect(tally.rows, `${name} has notification rows`).toBeGreaterThan(0)
  expect(tally.mails, `${name}: one message per notification row`).toBe(tally.rows)
  for (const [to, r] of Object.entries(tally.byRecipient)) {
    expect(new Set(r.steps).size, `${name} → ${to}: one row per step`).toBe(r.steps.length)
    expect(r.messages, `${name} → ${to}: exactly one message per step`).toBe(r.steps.length)
  }
}

describe('more than one machine', () => {
  test('two app processes on one database and one Redis: live events cross between them, sessions are shared, and an escalation is mailed once although both run schedulers (also after the leader dies)', async () => {
    const people = await personIds()
    const priya = people[DEMO.priya]
    const tanks = await freshTanks(4)
    const run = tag()
    const smtpPort = await freePort()

    // A starts first and runs the local SMTP server; B finds the port taken and sends its mail there.
    const a = await startApp('app A', { smtpPort, schedulerIntervalMs: TICK_MS, redisUrl: redis!.url })
    const b = await startApp('app B', { smtpPort, schedulerIntervalMs: TICK_MS, redisUrl: redis!.url })
    apps.push(a, b)

    // Sessions live in MariaDB: signed in on A, the same cookie works on B.
    const tech = await signIn(a.url, DEMO.priya)
    const supervisor = await signIn(b.url, DEMO.supervisor)
    expect((await call(b.url, '/api/me', { cookie: tech })).body?.email).toBe(DEMO.priya)
    expect((await call(a.url, '/api/me', { cookie: supervisor })).body?.email).toBe(DEMO.supervisor)

    // A completion posted to A reaches sockets held by B (long-polling and websocket), through Redis.
    const onB = [await connect(b.url, supervisor), await connect(b.url, supervisor, ['websocket'])]
    const onA = await connect(a.url, tech, ['websocket'])
    const task = await makeTankTask(tanks[0], { title: `Two processes live ${run}`, assigneeId: null, status: 'open', priority: 'routine' })
    const arrivals = onB.map((s) => nextTask(s, task.id))
    const sentAt = performance.now()
    const done = await call(a.url, `/api/tasks/${task.id}/completion`, {
      method: 'POST',
      cookie: tech,
      body: { completionId: randomUUID(), readings: OK_READINGS },
    })
    expect(done.status).toBe(200)
    const received = await Promise.all(arrivals)
    const crossMs = Math.round(performance.now() - sentAt)
    for (const t of received) expect(t).toMatchObject({ id: task.id, status: 'done', completedById: priya })

    // And the other way: an assignment made on B reaches a socket on A.
    const other = await makeTankTask(tanks[1], { title: `Two processes move ${run}`, assigneeId: null, status: 'open', priority: 'routine' })
    const onAArrival = nextTask(onA, other.id)
    const moved = await call(b.url, `/api/tasks/${other.id}`, { method: 'PATCH', cookie: supervisor, body: { version: other.version, assigneeId: null } })
    expect(moved.status).toBe(200)
    expect((await onAArrival).version).toBe(moved.body.version)

    // Both processes run schedulers, but only the GET_LOCK holder acts: the missed task is mailed once.
    const missed = await overdueTask(tanks[2], `Two processes missed ${run}`, priya, new Date(Date.now() - 500))
    await waitFor('the missed task to be mailed', () => mailedOnce(missed), 20_000)
    await sleep(6 * TICK_MS) // several more ticks on both processes
    const firstTally = await deliveryTally(missed)
    expectExactlyOnce('missed task', firstTally)
    expect(firstTally.byRecipient[DEMO.priya]?.messages).toBe(1)
    const leader = await schedulerLeader(ds, [a, b])
    expect(leader, 'one of the two processes holds the scheduler lock').not.toBeNull()

    // The leader dies: the other takes the lock over and carries on, still sending each message once.
    const survivor = leader === a ? b : a
    const killedAt = Date.now()
    await leader!.kill('SIGKILL')
    // If the leader was A, its SMTP server went with it; a mail host that stays up takes its port.
    if (leader === a) catcher = await startLocalSmtp(smtpPort)
    const takeover = await waitFor('the survivor to take the scheduler lock', () => schedulerLeader(ds, [survivor]), 10_000, 100)
    const takeoverMs = Date.now() - killedAt
    expect(takeover).toBe(survivor)
    const later = await overdueTask(tanks[3], `Two processes after failover ${run}`, priya, new Date(Date.now() - 500))
    await waitFor('the missed task to be mailed by the survivor', () => mailedOnce(later), 20_000)
    await sleep(4 * TICK_MS)
    const secondTally = await deliveryTally(later)
    expectExactlyOnce('missed task after failover', secondTally)
    expect(await deliveryTally(missed)).toEqual(firstTally) // nothing sent again for the first one
    expect(survivor.alive()).toBe(true)

    summary('two-processes', {
      'processes (ports)': `A :${a.port} (local SMTP), B :${b.port}; Redis ${redis!.url}`,
      'completion on A → tasks:updated on B (polling + websocket), ms': crossMs,
      'assignment on B → socket on A': 'received',
      'missed task: messages / notification rows': `${firstTally.mails} / ${firstTally.rows}`,
      'scheduler leader before the kill': leader!.name,
      'lock taken over by the survivor after SIGKILL (ms)': takeoverMs,
      'missed task after failover: messages / rows': `${secondTally.mails} / ${secondTally.rows}`,
    })
  })
})
