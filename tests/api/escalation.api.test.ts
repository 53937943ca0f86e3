import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import request from 'supertest'
import { db } from '#server/db/data-source'
import { startScheduler } from '#server/jobs/scheduler'
import { advanceTaskStatuses } from '#server/jobs/status-clock'
import { startLocalSmtp } from '#server/mail/local-smtp'
import { signAckToken } from '#server/mail/ack-token'
import { AlertEntity } from '#server/modules/completions/completion.entities'
import { createTransport, deliverPending } from '#server/modules/escalation/deliver'
import { runEscalations } from '#server/modules/escalation/escalate'
import { createLadder } from '#server/modules/escalation/ladders.service'
import { NotificationEntity } from '#server/modules/escalation/escalation.entities'
import { OnCallEntity } from '#server/modules/roster/roster.entities'
import { ensureFacilityAndParameters, makeAreaWithTanks, uniqueCode } from '#tests/support/facility-fixtures'
import { messagesTo, startMailCatcher } from '#tests/support/mail-fixtures'
import { makeTankTask } from '#tests/support/task-fixtures'
import { startTestApp, type TestApp } from '#tests/support/test-app'

let t: TestApp
let mail: Awaited<ReturnType<typeof startMailCatcher>>
beforeAll(async () => {
  t = await startTestApp({}, { ownDatabase: true })
  await ensureFacilityAndParameters()
  mail = await startMailCatcher(t.config)
})
afterAll(async () => {
  await mail.close()
  await t.close()
})

const MIN = 60_000

/** A welfare-critical task, assigned, that passed its grace at `missedAt`; and someone on call then. */
async function missedTask(missedAt: Date) {
  const { tanks } = await makeAreaWithTanks(1)
  const assignee = await t.createPersonWithRole('technician')
  const onCall = await t.createPersonWithRole('technician', { onCallEligible: true })
  // The on-call duty covers only this alert's window, so the on-call step reaches exactly them.
  await db()
    .getRepository(OnCallEntity)
    .save({
      personId: onCall.id,
      fromDate: '2000-01-01',
      toDate: '2000-01-02',
      startsAt: new Date(missedAt.getTime() - 60 * MIN),
      endsAt: new Date(missedAt.getTime() + 600 * MIN),
    })
  const due = new Date(missedAt.getTime() - 60 * MIN)
  const task = await makeTankTask(tanks[0], {
    title: `Morning tank check ${uniqueCode('m')}`,
    assigneeId: assignee.id,
    dueAt: due,
    windowStartAt: new Date(due.getTime() - 30 * MIN),
    graceUntil: missedAt,
    status: 'overdue',
    localStart: '2031-01-01T07:30:00',
  })
  await advanceTaskStatuses(db(), new Date(missedAt.getTime() + 1000))
  const alert = await db().getRepository(AlertEntity).findOneByOrFail({ taskId: task.id, kind: 'missed_task' })
  return { task, assignee, onCall, alert }
}

/** Mail about this test's own task: other files' alerts may reach the same on-call person. */
const mailsAbout = async (task: { title: string }, email: string) => (await messagesTo(email)).filter((m) => m.subject.includes(task.title))

const tick = async (at: Date) => {
  await runEscalations(at)
  await deliverPending(mail.config, mail.transport, at)
}

describe('missed-task escalation by e-mail', () => {
  test('the first step mails the assignee with what, where and how late; without an answer the next step mails the on-call person 20 minutes later', async () => {
    const missedAt = new Date(Date.now() + 5000 * MIN)
    const { assignee, onCall, task, alert } = await missedTask(missedAt)
    const ladder = await createLadder({
      name: 'Assignee then on call',
      steps: [
        { afterMinutes: 0, notify: [{ kind: 'assignee' }] },
        { afterMinutes: 20, notify: [{ kind: 'on_call' }] },
      ],
    })
    await db().getRepository(AlertEntity).update(alert.id, { ladderId: ladder.id })
    await tick(new Date(missedAt.getTime() + 2000))
    const first = await mailsAbout(task, assignee.email)
    expect(first).toHaveLength(1)
    expect(first[0].subject).toMatch(new RegExp(`^MISSED: ${task.title} at .+, 1 h late$`))
    expect(first[0].text).toContain(`/tasks/${task.id}`)
    expect(first[0].text).toMatch(/\/ack\/\d+\.\d+\./)
    expect(first[0].html).toContain('Acknowledge')
    expect(await mailsAbout(task, onCall.email)).toHaveLength(0)
    await tick(new Date(missedAt.getTime() + 19 * MIN))
    expect(await mailsAbout(task, onCall.email)).toHaveLength(0)
    await tick(new Date(missedAt.getTime() + 21 * MIN))
    const second = await mailsAbout(task, onCall.email)
    expect(second).toHaveLength(1)
    expect(second[0].text).toContain('step 2 of the escalation')
    expect(await mailsAbout(task, assignee.email)).toHaveLength(1)
  })

  test('following the acknowledge link records who answered and stops further steps; reuse and forgery are refused', async () => {
    const missedAt = new Date(Date.now() + 9000 * MIN)
    const { assignee, alert, task } = await missedTask(missedAt)
    await tick(new Date(missedAt.getTime() + 1000))
    const [message] = await mailsAbout(task, assignee.email)
    const path = /\/ack\/[\w.-]+/.exec(message.text)![0]
    await request(t.app).get(path).expect(200)
    const res = await request(t.app).post(path).type('form').send({}).expect(200)
    expect(res.text).toContain('Acknowledged')
    const after = await db().getRepository(AlertEntity).findOneByOrFail({ id: alert.id })
    expect(after.acknowledgedById).toBe(assignee.id)
    await request(t.app).post(path).type('form').send({}).expect(409)
    const forged = path.replace(/.$/, (c) => (c === 'A' ? 'B' : 'A'))
    await request(t.app).post(forged).type('form').send({}).expect(400)
    const countBefore = await db().getRepository(NotificationEntity).countBy({ alertId: alert.id })
    await tick(new Date(missedAt.getTime() + 120 * MIN))
    expect(await db().getRepository(NotificationEntity).countBy({ alertId: alert.id })).toBe(countBefore)
  })

  test('an expired acknowledge token is refused', async () => {
    const missedAt = new Date(Date.now() + 13000 * MIN)
    const { alert } = await missedTask(missedAt)
    await tick(new Date(missedAt.getTime() + 1000))
    const [row] = await db()
      .getRepository(NotificationEntity)
      .find({ where: { alertId: alert.id } })
    const token = signAckToken(t.config.ackSecret, row.id, new Date(Date.now() - 1000))
    const res = await request(t.app).post(`/ack/${token}`).type('form').send({}).expect(400)
    expect(res.text).toContain('expired')
  })

  test('two schedulers against one database send each message once', async () => {
    const missedAt = new Date(Date.now() - 2 * MIN)
    const { assignee, task } = await missedTask(missedAt)
    const lockName = `escalation_${Date.now()}`
    const a = startScheduler(db(), { intervalMs: 3_600_000, lockName, mail })
    const b = startScheduler(db(), { intervalMs: 3_600_000, lockName, mail })
    await Promise.all([a.tick(), b.tick(), a.tick(), b.tick()])
    await Promise.all([a.stop(), b.stop()])
    // Both also race deliveries directly: the claim on each row still lets only one send it.
    await Promise.all([deliverPending(mail.config, mail.transport, new Date()), deliverPending(mail.config, mail.transport, new Date())])
    expect(await mailsAbout(task, assignee.email)).toHaveLength(1)
  })

  test('when the mail server is down, the message is kept, retried with back-off, and sent when it returns', async () => {
    const missedAt = new Date(Date.now() + 17000 * MIN)
    const { assignee, alert, task } = await missedTask(missedAt)
    const down = await startLocalSmtp(0)
    const port = down.port
    await down.close()
    const deadConfig = { ...mail.config, mail: { ...mail.config.mail, port } }
    const deadTransport = createTransport(deadConfig)
    await runEscalations(new Date(missedAt.getTime() + 1000))
    const failed = await deliverPending(deadConfig, deadTransport, new Date(missedAt.getTime() + 1000))
    expect(failed.failed).toBeGreaterThan(0)
    const row = await db().getRepository(NotificationEntity).findOneByOrFail({ alertId: alert.id, personId: assignee.id })
    expect(row).toMatchObject({ status: 'failed', attempts: 1 })
    expect(row.nextAttemptAt.getTime()).toBeGreaterThan(missedAt.getTime() + 1000)
    const back = await startLocalSmtp(port)
    try {
      const retried = await deliverPending(deadConfig, deadTransport, new Date(missedAt.getTime() + 5 * MIN))
      expect(retried.sent).toBeGreaterThan(0)
      expect(await mailsAbout(task, assignee.email)).toHaveLength(1)
    } finally {
      deadTransport.close()
      await back.close()
    }
  })

  test('completing the task in the app stops the ladder', async () => {
    const missedAt = new Date(Date.now() + 21000 * MIN)
    const { task, alert } = await missedTask(missedAt)
    await tick(new Date(missedAt.getTime() + 1000))
    await db()
      .getRepository((await import('#server/modules/tasks/task.entity')).TaskEntity)
      .update(task.id, { status: 'done', completedAt: new Date() })
    await tick(new Date(missedAt.getTime() + 90 * MIN))
    expect((await db().getRepository(AlertEntity).findOneByOrFail({ id: alert.id })).closedAt).not.toBeNull()
    expect(await db().getRepository(NotificationEntity).countBy({ alertId: alert.id, step: 2 })).toBe(0)
  })
})
