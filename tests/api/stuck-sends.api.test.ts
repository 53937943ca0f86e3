import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { randomUUID } from 'node:crypto'
import type { Channel, LadderStep } from '#shared/schemas/ladder'
import { db } from '#server/db/data-source'
import { startScheduler } from '#server/jobs/scheduler'
import { advanceTaskStatuses } from '#server/jobs/status-clock'
import { AlertEntity } from '#server/modules/completions/completion.entities'
import { acknowledgeAlert, runEscalations } from '#server/modules/escalation/escalate'
import { NotificationEntity } from '#server/modules/escalation/escalation.entities'
import { createLadder } from '#server/modules/escalation/ladders.service'
import { STUCK_SENDING_AFTER_MS } from '#server/modules/escalation/stuck-sends'
import { PersonEntity } from '#server/modules/people/person.entity'
import { OnCallEntity } from '#server/modules/roster/roster.entities'
import { ensureFacilityAndParameters, makeAreaWithTanks, uniqueCode } from '#tests/support/facility-fixtures'
import { messagesTo, startMailCatcher } from '#tests/support/mail-fixtures'
import { makeTankTask } from '#tests/support/task-fixtures'
import { startTestApp, type TestApp } from '#tests/support/test-app'
import { startTextCatcher, textsTo, uniquePhone } from '#tests/support/text-fixtures'

let t: TestApp
let mail: Awaited<ReturnType<typeof startMailCatcher>>
let texts: Awaited<ReturnType<typeof startTextCatcher>>
beforeAll(async () => {
  t = await startTestApp({}, { ownDatabase: true })
  await ensureFacilityAndParameters()
  mail = await startMailCatcher(t.config)
  texts = await startTextCatcher(t.app, mail.config)
})
afterAll(async () => {
  await texts.close()
  await mail.close()
  await t.close()
})

const MIN = 60_000
const rowsOf = (alertId: number) =>
  db()
    .getRepository(NotificationEntity)
    .find({ where: { alertId }, order: { id: 'ASC' } })
// Only texts about this task: each tick also runs the incident deadlines of earlier tests, which reach whoever is on call then.
const textsAbout = async (phone: string, title: string) => (await textsTo(phone)).filter((m) => m.body.includes(title))

/** The person on call at `at`, who accepts texts only (e-mail is the channel every person falls back to). */
async function onCallTexter(at: Date, channels: Channel[] = ['sms']) {
  const person = await t.createPersonWithRole('technician', { onCallEligible: true })
  const phone = uniquePhone()
  await db().getRepository(PersonEntity).update(person.id, { phone, channels })
  await db()
    .getRepository(OnCallEntity)
    .save({
      personId: person.id,
      fromDate: '2000-01-01',
      toDate: '2000-01-02',
      startsAt: new Date(at.getTime() - 60 * MIN),
      endsAt: new Date(at.getTime() + 600 * MIN),
    })
  return { ...person, phone }
}

/** A welfare-critical task missed at `missedAt` on a ladder that texts; its text row is queued and then claimed by a process that dies. */
async function textClaimedByADeadProcess(missedAt: Date) {
  const { tanks } = await makeAreaWithTanks(1)
  const steps: LadderStep[] = [{ afterMinutes: 0, notify: [{ kind: 'on_call' }], channels: ['sms'] }]
  const ladder = await createLadder({ name: uniqueCode('ladder'), steps })
  const due = new Date(missedAt.getTime() - 60 * MIN)
  const task = await makeTankTask(tanks[0], {
    title: `Smolt DO check ${randomUUID().slice(0, 4)}`,
    priority: 'welfare_critical',
    dueAt: due,
    windowStartAt: new Date(due.getTime() - 30 * MIN),
    graceUntil: missedAt,
    status: 'overdue',
  })
  await advanceTaskStatuses(db(), new Date(missedAt.getTime() + 1000))
  const alert = await db().getRepository(AlertEntity).findOneByOrFail({ taskId: task.id, kind: 'missed_task' })
  await db().getRepository(AlertEntity).update(alert.id, { ladderId: ladder.id })
  await runEscalations(new Date(missedAt.getTime() + 1000))
  const [queued] = await rowsOf(alert.id)
  // What the dead process left: the row claimed `pending → sending`, nothing sent, no answer stored.
  const claimedAt = new Date(missedAt.getTime() + 2000)
  await db().getRepository(NotificationEntity).update(queued.id, { status: 'sending', claimedAt })
  return { task, alert, claimedAt }
}

/** One tick of the real scheduler at the given moment, with mail and texts set up. */
async function tickAt(at: Date) {
  const scheduler = startScheduler(db(), {
    now: () => at,
    intervalMs: 3_600_000,
    lockName: `stuck-${randomUUID()}`,
    mail: { config: texts.config, transport: mail.transport, channels: { text: texts.sender } },
  })
  await scheduler.tick()
  await scheduler.stop()
}

describe('a message whose sender stopped between claiming and hearing back', () => {
  test('is left alone within the bound, then marked unknown without a second text, and the person is reached by e-mail instead; the alert record says so', async () => {
    const missedAt = new Date(Date.now() + 50_000 * MIN)
    const onCall = await onCallTexter(missedAt)
    const { task, alert, claimedAt } = await textClaimedByADeadProcess(missedAt)

    // A claim younger than the bound may still be in flight in a live process: untouched.
    await tickAt(new Date(claimedAt.getTime() + STUCK_SENDING_AFTER_MS - MIN))
    expect((await rowsOf(alert.id)).map((r) => [r.channel, r.status])).toEqual([['sms', 'sending']])

    await tickAt(new Date(claimedAt.getTime() + STUCK_SENDING_AFTER_MS + MIN))
    const rows = await rowsOf(alert.id)
    expect(rows.map((r) => [r.channel, r.status])).toEqual([
      ['sms', 'unknown'],
      ['email', 'sent'],
    ])
    expect(rows[0].lastError).toMatch(/^Unknown: the app stopped while sending/)
    expect(await textsAbout(onCall.phone, task.title)).toHaveLength(0)
    expect((await messagesTo(onCall.email)).filter((m) => m.subject.includes(task.title))).toHaveLength(1)

    // Later ticks neither resend the text nor mail again.
    await tickAt(new Date(claimedAt.getTime() + STUCK_SENDING_AFTER_MS + 10 * MIN))
    expect((await rowsOf(alert.id)).map((r) => [r.channel, r.status, r.attempts])).toEqual([
      ['sms', 'unknown', 0],
      ['email', 'sent', 1],
    ])
    expect(await textsAbout(onCall.phone, task.title)).toHaveLength(0)
    expect((await messagesTo(onCall.email)).filter((m) => m.subject.includes(task.title))).toHaveLength(1)

    const { agent } = await t.signedInAgent('supervisor')
    const [record] = (await agent.get(`/api/tasks/${task.id}/escalations`).expect(200)).body
    expect(record.notifications).toMatchObject([
      { channel: 'sms', destination: onCall.phone, status: 'unknown', lastError: expect.stringContaining('Not sent again') },
      { channel: 'email', status: 'sent' },
    ])
  })

  test('once the alert is acknowledged, the stuck text is marked unknown and no fallback goes out', async () => {
    const missedAt = new Date(Date.now() + 52_000 * MIN)
    const onCall = await onCallTexter(missedAt)
    const { task, alert, claimedAt } = await textClaimedByADeadProcess(missedAt)
    await acknowledgeAlert(alert.id, onCall.id, new Date(claimedAt.getTime() + MIN))

    await tickAt(new Date(claimedAt.getTime() + STUCK_SENDING_AFTER_MS + MIN))
    expect((await rowsOf(alert.id)).map((r) => [r.channel, r.status])).toEqual([
      ['sms', 'unknown'],
      ['email', 'superseded'],
    ])
    expect(await textsAbout(onCall.phone, task.title)).toHaveLength(0)
    expect((await messagesTo(onCall.email)).filter((m) => m.subject.includes(task.title))).toHaveLength(0)
  })
})
