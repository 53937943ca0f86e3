import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import type { DataSource } from 'typeorm'
import { DEMO, call, freePort, openDb, signIn, sleep, startApp, summary, waitFor, type AppProcess } from './support/harness'
import { deliveryTally, freshTanks, mailsFor, notificationsFor, overdueTask, personIds, tag, taskStatus } from './support/fixtures'

let ds: DataSource
let smtpPort: number
const apps: AppProcess[] = []

beforeAll(async () => {
  ds = await openDb()
  smtpPort = await freePort()
})
afterAll(async () => {
  for (const app of apps) await app.kill('SIGKILL')
  await ds?.destroy()
})

const TICK_MS = 500

/** Sent: the task is missed, its first step is recorded and every row of it has gone out. */
const mailedOnce = async (task: { id: number; title: string }) => {
  const rows = await notificationsFor(task.id)
  return (await taskStatus(task.id)) === 'missed' && rows.length > 0 && rows.every((n) => n.status === 'sent') && (await mailsFor(task.title)).length > 0
}

describe('app restart', () => {
  test('after a SIGKILL and a restart, a session from before still works, the scheduler resumes, and no escalation is mailed twice', async () => {
    const people = await personIds()
    const priya = people[DEMO.priya]
    const tanks = await freshTanks(3)
    const run = tag()

    const first = await startApp('app (before)', { smtpPort, schedulerIntervalMs: TICK_MS })
    apps.push(first)
    const cookie = await signIn(first.url, DEMO.priya)
    const managerCookie = await signIn(first.url, DEMO.manager)
    expect((await call(first.url, '/api/me', { cookie })).status).toBe(200)

    // A: missed and mailed while the first process runs.
    const a = await overdueTask(tanks[0], `Restart A ${run}`, priya, new Date(Date.now() - 1000))
    await waitFor('task A to be missed and mailed', () => mailedOnce(a), 20_000)
    const beforeKill = await deliveryTally(a)

    // B1: its grace passes while the app is down. B2: its grace passes after the restart.
    const b1 = await overdueTask(tanks[1], `Restart B1 ${run}`, priya, new Date(Date.now() + 800))
    const b2Grace = new Date(Date.now() + 12_000)
    const b2 = await overdueTask(tanks[2], `Restart B2 ${run}`, priya, b2Grace)
    const killedAt = Date.now()
    await first.kill('SIGKILL')
    expect(first.alive()).toBe(false)
    await sleep(1500)
    expect(await taskStatus(b1.id)).toBe('overdue') // nobody moved it while the app was away

    const second = await startApp('app (after)', { smtpPort, schedulerIntervalMs: TICK_MS })
    apps.push(second)
    const readyAt = Date.now()
    const downMs = readyAt - killedAt

    // The session lives in MariaDB, so the cookie from before the kill still signs Priya in.
    const me = await call(second.url, '/api/me', { cookie })
    expect(me.status).toBe(200)
    expect(me.body.email).toBe(DEMO.priya)

    // The scheduler resumes: B1 (missed during the downtime) at once, B2 once its grace passes.
    await waitFor('task B1 to be missed and mailed after the restart', () => mailedOnce(b1), 15_000)
    const b1MailedMs = Date.now() - readyAt
    expect(readyAt).toBeLessThan(b2Grace.getTime()) // B2's grace really passes after the restart
    expect(await taskStatus(b2.id)).toBe('overdue')
    await waitFor('task B2 to be missed and mailed after its grace', () => mailedOnce(b2), b2Grace.getTime() - Date.now() + 15_000)
    const b2MailedAfterGraceMs = Date.now() - b2Grace.getTime()
    await sleep(4 * TICK_MS) // a few more ticks: nothing may be sent again

    const tallies = { A: await deliveryTally(a), B1: await deliveryTally(b1), B2: await deliveryTally(b2) }
    for (const [name, tally] of Object.entries(tallies)) {
      expect(tally.rows, `${name} has notification rows`).toBeGreaterThan(0)
      expect(tally.mails, `${name}: one message per notification row`).toBe(tally.rows)
      for (const [to, r] of Object.entries(tally.byRecipient)) {
        expect(new Set(r.steps).size, `${name} → ${to}: one row per step`).toBe(r.steps.length)
        expect(
          r.statuses.every((s) => s === 'sent'),
          `${name} → ${to}: every row sent`,
        ).toBe(true)
        expect(r.messages, `${name} → ${to}: exactly one message per step`).toBe(r.steps.length)
      }
    }
    expect(tallies.A).toEqual(beforeKill) // the restart sent nothing more for A
    expect(tallies.A.byRecipient[DEMO.priya]?.messages).toBe(1)

    // The manager's Outbox page (through the new process, with the old session) shows each once.
    const outbox = await call(second.url, '/api/outbox', { cookie: managerCookie })
    expect(outbox.status).toBe(200)
    const subjects = (outbox.body as Array<{ subject: string }>).map((m) => m.subject)
    for (const t of [a, b1, b2]) expect(subjects.filter((s) => s.includes(t.title))).toHaveLength(1)
    expect(second.alive()).toBe(true)

    summary('app-restart', {
      'first process ready in (ms)': first.startMs,
      'down for (ms, SIGKILL → healthy again)': downMs,
      'restarted process ready in (ms)': second.startMs,
      'session from before the kill': `GET /api/me ${me.status}`,
      'B1 (grace passed while down) mailed after restart in (ms)': b1MailedMs,
      'B2 (grace passed after restart) mailed after its grace in (ms)': b2MailedAfterGraceMs,
      'messages per task (A, B1, B2)': [tallies.A.mails, tallies.B1.mails, tallies.B2.mails],
    })
  })
})
