import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import request from 'supertest'
import { In } from 'typeorm'
import type { Channel, LadderStep } from '#shared/schemas/ladder'
import { db } from '#server/db/data-source'
import { advanceTaskStatuses } from '#server/jobs/status-clock'
import { AlertEntity } from '#server/modules/completions/completion.entities'
import { deliverPending } from '#server/modules/escalation/deliver'
import { runEscalations } from '#server/modules/escalation/escalate'
import { NotificationEntity } from '#server/modules/escalation/escalation.entities'
import { PushSubscriptionEntity } from '#server/modules/escalation/push-subscription.entity'
import { createLadder } from '#server/modules/escalation/ladders.service'
import { PersonEntity } from '#server/modules/people/person.entity'
import { OnCallEntity } from '#server/modules/roster/roster.entities'
import { createPushSender } from '#server/push/push-client'
import { startFakePushService } from '#server/push/fake-push-service'
import { UNREACHABLE_NUMBER_PREFIX } from '#server/sms/fake-text-provider'
import { ensureFacilityAndParameters, makeAreaWithTanks, uniqueCode } from '#tests/support/facility-fixtures'
import { messagesTo, startMailCatcher } from '#tests/support/mail-fixtures'
import { makeTankTask } from '#tests/support/task-fixtures'
import { startTestApp, type TestApp } from '#tests/support/test-app'
import { TEST_PASSWORD } from '#seed/factories'
import { postWebhook, startTextCatcher, textsTo, uniquePhone } from '#tests/support/text-fixtures'

let t: TestApp
let mail: Awaited<ReturnType<typeof startMailCatcher>>
let texts: Awaited<ReturnType<typeof startTextCatcher>>
let pushService: Awaited<ReturnType<typeof startFakePushService>>
beforeAll(async () => {
  t = await startTestApp({}, { ownDatabase: true })
  await ensureFacilityAndParameters()
  mail = await startMailCatcher(t.config)
  texts = await startTextCatcher(t.app, { ...mail.config, sms: { ...mail.config.sms, maxPerHour: 6 } })
  pushService = await startFakePushService()
})
afterAll(async () => {
  await pushService.close()
  await texts.close()
  await mail.close()
  await t.close()
})

const MIN = 60_000

/** Someone who accepts these channels, with a mobile number, on call from an hour before `at` for ten hours. */
async function onCallPerson(at: Date, channels: Channel[], phone = uniquePhone()) {
  const person = await t.createPersonWithRole('technician', { onCallEligible: true })
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

/** `count` welfare-critical tasks missed at `missedAt`, each alert on the given ladder. */
async function missedWelfareTasks(missedAt: Date, steps: LadderStep[], count = 1) {
  const { tanks } = await makeAreaWithTanks(1)
  const ladder = await createLadder({ name: uniqueCode('ladder'), steps })
  const due = new Date(missedAt.getTime() - 60 * MIN)
  const tasks = []
  for (let i = 0; i < count; i++) {
    tasks.push(
      await makeTankTask(tanks[0], {
        title: `Oxygen check ${uniqueCode('o')}`,
        priority: 'welfare_critical',
        dueAt: due,
        windowStartAt: new Date(due.getTime() - 30 * MIN),
        graceUntil: missedAt,
        status: 'overdue',
        localStart: '2031-01-01T07:30:00',
      }),
    )
  }
  await advanceTaskStatuses(db(), new Date(missedAt.getTime() + 1000))
  const alerts = await db()
    .getRepository(AlertEntity)
    .findBy({ taskId: In(tasks.map((x) => x.id)), kind: 'missed_task' })
  await db()
    .getRepository(AlertEntity)
    .update({ id: In(alerts.map((a) => a.id)) }, { ladderId: ladder.id })
  return { tasks, alerts }
}

const tick = async (at: Date) => {
  await runEscalations(at)
  await deliverPending(texts.config, mail.transport, at, { text: texts.sender, push: createPushSender(texts.config) })
}
const signIn = async (email: string) => {
  const agent = request.agent(t.app)
  await agent.post('/api/session').send({ email, password: TEST_PASSWORD }).expect(200)
  return agent
}
const rowsOf = (alertId: number) =>
  db()
    .getRepository(NotificationEntity)
    .find({ where: { alertId }, order: { id: 'ASC' } })

describe('on-call channels: e-mail, text and push', () => {
  test('a missed welfare-critical task reaches the person on call at that moment by every channel they enabled, even where the step names only e-mail', async () => {
    const missedAt = new Date(Date.now() + 30_000 * MIN)
    const onCall = await onCallPerson(missedAt, ['email', 'sms'])
    // Someone whose duty starts only after the alert is not the one reached.
    const later = await t.createPersonWithRole('technician', { onCallEligible: true })
    await db()
      .getRepository(OnCallEntity)
      .save({
        personId: later.id,
        fromDate: '2000-01-01',
        toDate: '2000-01-02',
        startsAt: new Date(missedAt.getTime() + 60 * MIN),
        endsAt: new Date(missedAt.getTime() + 120 * MIN),
      })
    const { tasks, alerts } = await missedWelfareTasks(missedAt, [{ afterMinutes: 0, notify: [{ kind: 'on_call' }], channels: ['email'] }])
    await tick(new Date(missedAt.getTime() + 2000))

    const rows = await rowsOf(alerts[0].id)
    expect(rows.map((r) => [r.personId, r.channel, r.status])).toEqual([
      [onCall.id, 'email', 'sent'],
      [onCall.id, 'sms', 'sent'],
    ])
    const [mailed] = (await messagesTo(onCall.email)).filter((m) => m.subject.includes(tasks[0].title))
    expect(mailed.subject).toMatch(/^MISSED: Oxygen check/)
    const [text] = await textsTo(onCall.phone)
    const sms = rows.find((r) => r.channel === 'sms')!
    expect(text.body).toContain(tasks[0].title)
    expect(text.body).toContain(`Reply ${sms.replyCode} to acknowledge`)
    expect(text.from).toBe(texts.config.sms.from)
    expect(sms.providerId).toBe(text.sid)
    expect(sms.providerStatus).toBe('queued')
  })

  test('with push accepted and this phone subscribed, the person on call gets e-mail, text and an encrypted push whose acknowledge action answers in their name', async () => {
    const missedAt = new Date(Date.now() + 32_000 * MIN)
    const onCall = await onCallPerson(missedAt, ['email', 'sms', 'push'])
    const agent = await signIn(onCall.email)
    const { publicKey } = (await agent.get('/api/push/public-key').expect(200)).body
    // The phone subscribes with the server's key, as PushManager.subscribe would, and registers the result.
    const device = pushService.subscribe(publicKey)
    await agent.post('/api/me/push-subscriptions').send(device).expect(204)
    const { tasks, alerts } = await missedWelfareTasks(missedAt, [{ afterMinutes: 0, notify: [{ kind: 'on_call' }], channels: ['email'] }])
    await tick(new Date(missedAt.getTime() + 2000))

    const rows = await rowsOf(alerts[0].id)
    expect(rows.map((r) => [r.channel, r.status])).toEqual([
      ['email', 'sent'],
      ['sms', 'sent'],
      ['push', 'sent'],
    ])
    expect((await messagesTo(onCall.email)).filter((m) => m.subject.includes(tasks[0].title))).toHaveLength(1)
    expect(await textsTo(onCall.phone)).toHaveLength(1)
    // The fake push service checked the VAPID signature and decrypted the body with the phone's private key.
    const [pushed] = pushService.receivedAt(device.endpoint)
    expect(pushed.urgency).toBe('high')
    const payload = pushed.payload as { title: string; url: string; ackUrl: string; tag: string }
    expect(payload).toMatchObject({ title: expect.stringMatching(/^MISSED: Oxygen check/), url: `/tasks/${tasks[0].id}`, tag: `alert-${alerts[0].id}` })
    expect(rows[2].providerId).toMatch(/^http:\/\/127\.0\.0\.1:\d+\/message\//)

    // The notification's Acknowledge action posts the token for JSON, once.
    const answered = await request(t.app).post(payload.ackUrl).set('accept', 'application/json').expect(200)
    expect(answered.body).toMatchObject({ status: 'acknowledged', taskId: tasks[0].id })
    expect((await db().getRepository(AlertEntity).findOneByOrFail({ id: alerts[0].id })).acknowledgedById).toBe(onCall.id)
    expect((await request(t.app).post(payload.ackUrl).set('accept', 'application/json').expect(409)).body.status).toBe('used')
  })

  test('a push subscription the push service calls gone is forgotten, and the person is reached by e-mail instead', async () => {
    const missedAt = new Date(Date.now() + 36_000 * MIN)
    const onCall = await onCallPerson(missedAt, ['push'])
    const agent = await signIn(onCall.email)
    const device = pushService.subscribe(t.config.push.vapid!.publicKey)
    await agent.post('/api/me/push-subscriptions').send(device).expect(204)
    pushService.unsubscribe(device.endpoint)
    const { tasks, alerts } = await missedWelfareTasks(missedAt, [{ afterMinutes: 0, notify: [{ kind: 'on_call' }], channels: ['push'] }])
    await tick(new Date(missedAt.getTime() + 2000))
    await deliverPending(texts.config, mail.transport, new Date(missedAt.getTime() + 3000), { push: createPushSender(texts.config) })

    const rows = await rowsOf(alerts[0].id)
    expect(rows.map((r) => [r.channel, r.status])).toEqual([
      ['push', 'undelivered'],
      ['email', 'sent'],
    ])
    expect(rows[0].lastError).toContain('stopped accepting push alerts')
    expect((await messagesTo(onCall.email)).filter((m) => m.subject.includes(tasks[0].title))).toHaveLength(1)
    expect(await db().getRepository(PushSubscriptionEntity).findBy({ personId: onCall.id })).toHaveLength(0)
  })

  test('a device is registered and removed only by its own person; a malformed subscription is refused', async () => {
    const [owner, other] = [await t.createPersonWithRole('technician'), await t.createPersonWithRole('technician')]
    const [ownerAgent, otherAgent] = [await signIn(owner.email), await signIn(other.email)]
    const device = pushService.subscribe(t.config.push.vapid!.publicKey)
    await ownerAgent.post('/api/me/push-subscriptions').send({ endpoint: 'javascript:alert(1)', keys: device.keys }).expect(400)
    await ownerAgent.post('/api/me/push-subscriptions').send(device).expect(204)
    await ownerAgent.post('/api/me/push-subscriptions').send(device).expect(204)
    const devicesOf = (personId: number) => db().getRepository(PushSubscriptionEntity).findBy({ personId })
    expect(await devicesOf(owner.id)).toHaveLength(1)

    await otherAgent.delete('/api/me/push-subscriptions').send({ endpoint: device.endpoint }).expect(204)
    expect(await devicesOf(owner.id)).toHaveLength(1)
    await ownerAgent.delete('/api/me/push-subscriptions').send({ endpoint: device.endpoint }).expect(204)
    expect(await devicesOf(owner.id)).toHaveLength(0)
  })

  test('a reply with the code acknowledges the alert in the name of the person texted, and no further step is sent', async () => {
    const missedAt = new Date(Date.now() + 34_000 * MIN)
    const onCall = await onCallPerson(missedAt, ['sms'])
    const manager = await t.createPersonWithRole('manager')
    const { alerts } = await missedWelfareTasks(missedAt, [
      { afterMinutes: 0, notify: [{ kind: 'on_call' }], channels: ['sms'] },
      { afterMinutes: 20, notify: [{ kind: 'person', personId: manager.id }], channels: ['email'] },
    ])
    await tick(new Date(missedAt.getTime() + 2000))
    const [sms] = await rowsOf(alerts[0].id)

    const wrong = await texts.fake.deliverInbound(onCall.phone, 'OK 0000')
    expect(wrong.text).toContain('did not recognise')
    expect((await db().getRepository(AlertEntity).findOneByOrFail({ id: alerts[0].id })).acknowledgedAt).toBeNull()

    const answer = await texts.fake.deliverInbound(onCall.phone, `ok ${sms.replyCode}`)
    expect(answer.status).toBe(200)
    expect(answer.text).toContain('<Message>Acknowledged.')
    const alert = await db().getRepository(AlertEntity).findOneByOrFail({ id: alerts[0].id })
    expect(alert.acknowledgedById).toBe(onCall.id)

    await tick(new Date(missedAt.getTime() + 30 * MIN))
    expect((await rowsOf(alerts[0].id)).map((r) => r.step)).toEqual([0])
    expect(await messagesTo(manager.email)).toHaveLength(0)
    // The same reply again changes nothing.
    expect((await texts.fake.deliverInbound(onCall.phone, sms.replyCode!)).text).toContain('Already answered')
  })

  test('status callbacks are shown on the alert record; a forged one (wrong signature) is refused and changes nothing', async () => {
    const missedAt = new Date(Date.now() + 38_000 * MIN)
    const onCall = await onCallPerson(missedAt, ['sms'])
    const { tasks, alerts } = await missedWelfareTasks(missedAt, [{ afterMinutes: 0, notify: [{ kind: 'on_call' }], channels: ['sms'] }])
    await tick(new Date(missedAt.getTime() + 2000))
    const [sms] = await rowsOf(alerts[0].id)
    const params = {
      AccountSid: texts.config.sms.accountSid,
      MessageSid: sms.providerId!,
      MessageStatus: 'undelivered',
      ErrorCode: '30003',
      To: onCall.phone,
      From: texts.config.sms.from,
    }

    await postWebhook(t.app, t.config, '/hooks/sms/status', params, 'not-the-auth-token').expect(403)
    await request(t.app).post('/hooks/sms/status').type('form').send(params).expect(403)
    expect((await rowsOf(alerts[0].id))[0]).toMatchObject({ providerStatus: 'queued', status: 'sent' })
    await postWebhook(t.app, t.config, '/hooks/sms/status', { ...params, MessageStatus: 'delivered' }).expect(204)
    await postWebhook(t.app, t.config, '/hooks/sms/status', params).expect(204)

    const { agent } = await t.signedInAgent('supervisor')
    const [record] = (await agent.get(`/api/tasks/${tasks[0].id}/escalations`).expect(200)).body
    const text = record.notifications.find((n: { channel: string }) => n.channel === 'sms')
    // Delivered came first, so a later out-of-order failure does not take it back.
    expect(text).toMatchObject({ channel: 'sms', destination: onCall.phone, providerId: sms.providerId, providerStatus: 'delivered', status: 'sent' })
  })

  test('a text the provider cannot deliver is marked on the record and the person is tried by e-mail instead', async () => {
    const missedAt = new Date(Date.now() + 42_000 * MIN)
    const onCall = await onCallPerson(missedAt, ['sms'], `${UNREACHABLE_NUMBER_PREFIX}${String(Math.floor(Math.random() * 1e4)).padStart(4, '0')}`)
    const { tasks, alerts } = await missedWelfareTasks(missedAt, [{ afterMinutes: 0, notify: [{ kind: 'on_call' }], channels: ['sms'] }])
    await tick(new Date(missedAt.getTime() + 2000))
    await deliverPending(texts.config, mail.transport, new Date(missedAt.getTime() + 3000), { text: texts.sender })

    const rows = await rowsOf(alerts[0].id)
    expect(rows.map((r) => [r.channel, r.status])).toEqual([
      ['sms', 'undelivered'],
      ['email', 'sent'],
    ])
    expect(rows[0].lastError).toContain('not a valid phone number')
    expect((await messagesTo(onCall.email)).filter((m) => m.subject.includes(tasks[0].title))).toHaveLength(1)
    const { agent } = await t.signedInAgent('technician')
    const [record] = (await agent.get(`/api/tasks/${tasks[0].id}/escalations`).expect(200)).body
    expect(record.notifications[0]).toMatchObject({ channel: 'sms', status: 'undelivered' })
    expect(record.notifications[0].lastError).toContain('not a valid phone number')
  })

  test('a storm of 50 alerts sends no more than the hourly limit of texts to one person, then one summary; the records say what was held back', async () => {
    const missedAt = new Date(Date.now() + 46_000 * MIN)
    const onCall = await onCallPerson(missedAt, ['sms'])
    const { alerts } = await missedWelfareTasks(missedAt, [{ afterMinutes: 0, notify: [{ kind: 'on_call' }], channels: ['sms'] }], 50)
    expect(alerts).toHaveLength(50)
    await tick(new Date(missedAt.getTime() + 2000))
    await tick(new Date(missedAt.getTime() + 60_000))

    const received = await textsTo(onCall.phone)
    const summaries = received.filter((m) => m.body.startsWith('Roundtide: more alerts'))
    const single = received.filter((m) => !m.body.startsWith('Roundtide: more alerts'))
    expect(single.length).toBe(6)
    expect(summaries).toHaveLength(1)
    expect(summaries[0].body).toContain('44 more were not texted')
    const rows = await db()
      .getRepository(NotificationEntity)
      .findBy({ alertId: In(alerts.map((a) => a.id)) })
    expect(rows.filter((r) => r.status === 'sent')).toHaveLength(6)
    const held = rows.filter((r) => r.status === 'suppressed')
    expect(held).toHaveLength(44)
    expect(held[0].lastError).toContain('6 texts an hour')
  })
})
