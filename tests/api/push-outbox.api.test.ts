import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { randomUUID } from 'node:crypto'
import request from 'supertest'
import { TEST_PASSWORD } from '#seed/factories'
import { db } from '#server/db/data-source'
import { advanceTaskStatuses } from '#server/jobs/status-clock'
import { AlertEntity } from '#server/modules/completions/completion.entities'
import { deliverPending } from '#server/modules/escalation/deliver'
import { runEscalations } from '#server/modules/escalation/escalate'
import { NotificationEntity } from '#server/modules/escalation/escalation.entities'
import { localPushes } from '#server/modules/escalation/push-outbox.service'
import { PushSubscriptionEntity } from '#server/modules/escalation/push-subscription.entity'
import { PersonEntity } from '#server/modules/people/person.entity'
import { OnCallEntity } from '#server/modules/roster/roster.entities'
import { startFakePushService, type FakePushService } from '#server/push/fake-push-service'
import { createPushSender } from '#server/push/push-client'
import { ensureFacilityAndParameters, makeAreaWithTanks } from '#tests/support/facility-fixtures'
import { startMailCatcher } from '#tests/support/mail-fixtures'
import { makeTankTask } from '#tests/support/task-fixtures'
import { startTestApp, testConfig, type TestApp } from '#tests/support/test-app'

let t: TestApp
let pushService: FakePushService
let mail: Awaited<ReturnType<typeof startMailCatcher>>
beforeAll(async () => {
  // As `npm start` in local push mode: the stand-in keeps what it decrypts, and the app knows where it listens.
  pushService = await startFakePushService({ keep: true })
  t = await startTestApp({ push: { ...testConfig().push, mode: 'local', localUrl: pushService.url } }, { ownDatabase: true })
  await ensureFacilityAndParameters()
  mail = await startMailCatcher(t.config)
})
afterAll(async () => {
  await mail.close()
  await t.close()
  await pushService.close()
})

const MIN = 60_000

/** A welfare-critical task missed at `missedAt`; the person on call then gets it by push only. */
async function missedWhileOnCall(personId: number, missedAt: Date) {
  await db()
    .getRepository(PersonEntity)
    .update(personId, { channels: ['push'] })
  await db()
    .getRepository(OnCallEntity)
    .save({
      personId,
      fromDate: '2000-01-01',
      toDate: '2000-01-02',
      startsAt: new Date(missedAt.getTime() - 60 * MIN),
      endsAt: new Date(missedAt.getTime() + 120 * MIN),
    })
  const { tanks } = await makeAreaWithTanks(1)
  const title = `Hatchery tray flow ${randomUUID().slice(0, 4)}`
  const task = await makeTankTask(tanks[0], {
    title,
    priority: 'welfare_critical',
    status: 'overdue',
    dueAt: new Date(missedAt.getTime() - 60 * MIN),
    graceUntil: missedAt,
  })
  await advanceTaskStatuses(db(), new Date(missedAt.getTime() + 1000))
  await runEscalations(new Date(missedAt.getTime() + 1000))
  await deliverPending(mail.config, mail.transport, new Date(missedAt.getTime() + 2000), { push: createPushSender(t.config) })
  const alert = await db().getRepository(AlertEntity).findOneByOrFail({ taskId: task.id, kind: 'missed_task' })
  return { task, alert }
}

describe('the push outbox in local push mode', () => {
  test('a manager adds a stand-in device, an alert pushed to it is listed as the stand-in decrypted it (who, when, title, body); a device the stand-in no longer knows is listed as refused', async () => {
    const manager = await t.createPersonWithRole('manager', { name: 'Isolde Farrant' })
    const agent = request.agent(t.app)
    await agent.post('/api/session').send({ email: manager.email, password: TEST_PASSWORD }).expect(200)
    expect((await agent.get('/api/outbox/pushes').expect(200)).body).toEqual([])

    await agent.post('/api/outbox/push-devices').expect(204)
    const [device] = await db().getRepository(PushSubscriptionEntity).findBy({ personId: manager.id })
    expect(device.endpoint.startsWith(`${pushService.url}/push/`)).toBe(true)

    const first = await missedWhileOnCall(manager.id, new Date(Date.now() + 60_000 * MIN))
    const [listed] = (await agent.get('/api/outbox/pushes').expect(200)).body
    expect(listed).toMatchObject({
      personName: 'Isolde Farrant',
      endpoint: device.endpoint,
      status: 'received',
      title: expect.stringMatching(new RegExp(`^MISSED: ${first.task.title}`)),
      urgency: 'high',
      note: null,
    })
    expect(listed.body).toMatch(/^This task was not done/)
    expect(Date.parse(listed.receivedAt)).not.toBeNaN()
    expect((await db().getRepository(NotificationEntity).findOneByOrFail({ alertId: first.alert.id, channel: 'push' })).status).toBe('sent')

    // The stand-in forgets the device (as a browser that dropped it): the next push is refused, kept, and the app forgets the device too.
    pushService.unsubscribe(device.endpoint)
    await missedWhileOnCall(manager.id, new Date(Date.now() + 62_000 * MIN))
    const [refused] = (await agent.get('/api/outbox/pushes').expect(200)).body
    expect(refused).toMatchObject({ personName: null, endpoint: device.endpoint, status: 'refused', note: '410: No such subscription', title: '' })
    expect(await db().getRepository(PushSubscriptionEntity).findBy({ personId: manager.id })).toHaveLength(0)
  })

  test('outside local push mode there is no push outbox, and a technician may not read it', async () => {
    await expect(localPushes({ ...t.config, push: { ...t.config.push, mode: 'on', localUrl: null } })).rejects.toMatchObject({ status: 404 })
    const { agent } = await t.signedInAgent('technician')
    await agent.get('/api/outbox/pushes').expect(403)
    await agent.post('/api/outbox/push-devices').expect(403)
  })
})
