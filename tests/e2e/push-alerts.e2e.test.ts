import { randomUUID } from 'node:crypto'
import type { Worker } from 'playwright-core'
import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { db } from '#server/db/data-source'
import { advanceTaskStatuses } from '#server/jobs/status-clock'
import { AlertEntity } from '#server/modules/completions/completion.entities'
import { deliverPending } from '#server/modules/escalation/deliver'
import { runEscalations } from '#server/modules/escalation/escalate'
import { PersonEntity } from '#server/modules/people/person.entity'
import { OnCallEntity } from '#server/modules/roster/roster.entities'
import { startFakePushService, type FakePushService } from '#server/push/fake-push-service'
import { createPushSender } from '#server/push/push-client'
import { DESKTOP, PHONE, screenshot, startBrowserSession, type BrowserSession } from '#tests/support/browser'
import { ensureFacilityAndParameters, makeAreaWithTanks } from '#tests/support/facility-fixtures'
import { startMailCatcher } from '#tests/support/mail-fixtures'
import { openPushSettings } from '#tests/support/push-settings'
import { makeTankTask } from '#tests/support/task-fixtures'

const MIN = 60_000
let s: BrowserSession
let pushService: FakePushService
let mail: Awaited<ReturnType<typeof startMailCatcher>>
beforeAll(async () => {
  s = await startBrowserSession()
  await ensureFacilityAndParameters()
  pushService = await startFakePushService()
  mail = await startMailCatcher({ ...s.config, publicUrl: s.url })
})
afterAll(async () => {
  await mail?.close()
  await pushService?.close()
  await s?.close()
})

/** What the service worker's global scope offers the test (see public/push-sw.js). */
interface WorkerScope {
  registration: ServiceWorkerRegistration
  roundtideNotificationClick(notification: Notification, action: string): Promise<{ status: string; title: string }>
}

const shownNotifications = (worker: Worker) =>
  worker.evaluate(async () =>
    (await (globalThis as unknown as WorkerScope).registration.getNotifications()).map((n) => ({
      title: n.title,
      tag: n.tag,
      actions: (n as Notification & { actions: Array<{ title: string }> }).actions.map((a) => a.title),
    })),
  )

describe('push alerts on the installed app', () => {
  test('the person on call registers this phone, the service worker shows the encrypted alert with Acknowledge and Open, and acknowledging records who answered', async () => {
    const person = await s.createPerson('technician', { name: 'Wren Halloway', onCallEligible: true })
    const now = Date.now()
    await db()
      .getRepository(PersonEntity)
      .update(person.id, { channels: ['push'] })
    await db()
      .getRepository(OnCallEntity)
      .save({ personId: person.id, fromDate: '2000-01-01', toDate: '2000-01-02', startsAt: new Date(now - 60 * MIN), endsAt: new Date(now + 600 * MIN) })

    // Service workers are allowed here (other journeys block them) and notifications are permitted, as after "Allow".
    const context = await s.newContext({ viewport: PHONE, serviceWorkers: 'allow' })
    await context.grantPermissions(['notifications'], { origin: s.url })
    const page = await context.newPage()
    await s.signIn(page, person.email)
    await openPushSettings(page)
    const worker = context.serviceWorkers()[0] ?? (await context.waitForEvent('serviceworker'))
    await screenshot(page, 'push-settings-phone')

    // Chromium's own push service is out of reach here, so the subscription a browser would make
    // (ECDH P-256 keys + auth secret) is made at the stand-in push service and registered as the page would.
    const publicKey = await page.evaluate(async () => (await (await fetch('/api/push/public-key')).json()).publicKey as string)
    const device = pushService.subscribe(publicKey)
    const registered = await page.evaluate(
      async (body) =>
        (await fetch('/api/me/push-subscriptions', { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify(body) })).status,
      device,
    )
    expect(registered).toBe(204)

    const { tanks } = await makeAreaWithTanks(1)
    const title = `Broodstock DO check ${randomUUID().slice(0, 4)}`
    const task = await makeTankTask(tanks[0], {
      title,
      priority: 'welfare_critical',
      status: 'overdue',
      dueAt: new Date(now - 61 * MIN),
      graceUntil: new Date(now - MIN),
    })
    await advanceTaskStatuses(db(), new Date())
    await runEscalations(new Date())
    await deliverPending(mail.config, mail.transport, new Date(), { push: createPushSender(s.config) })
    // The stand-in checked the VAPID signature and decrypted the body with the device's private key.
    await expect.poll(() => pushService.receivedAt(device.endpoint).length).toBe(1)
    const [received] = pushService.receivedAt(device.endpoint)
    expect(received.payload).toMatchObject({ title: expect.stringContaining(`MISSED: ${title}`), url: `/tasks/${task.id}` })

    // The decrypted message reaches the page's service worker as a push event, as Chromium would deliver it.
    const cdp = await context.newCDPSession(page)
    const registrationId = new Promise<string>((resolve) =>
      cdp.on('ServiceWorker.workerRegistrationUpdated', ({ registrations }) => registrations[0] && resolve(registrations[0].registrationId)),
    )
    await cdp.send('ServiceWorker.enable')
    await cdp.send('ServiceWorker.deliverPushMessage', {
      origin: new URL(s.url).origin,
      registrationId: await registrationId,
      data: JSON.stringify(received.payload),
    })
    await expect
      .poll(() => shownNotifications(worker))
      .toEqual([{ title: expect.stringContaining(`MISSED: ${title}`), tag: expect.stringMatching(/^alert-\d+$/), actions: ['Acknowledge', 'Open'] }])

    // The Acknowledge action: the worker posts the single-use token and says on the phone what happened.
    const outcome = await worker.evaluate(async () => {
      const scope = globalThis as unknown as WorkerScope
      const [alert] = await scope.registration.getNotifications()
      return scope.roundtideNotificationClick(alert, 'acknowledge')
    })
    expect(outcome).toMatchObject({ status: 'acknowledged', title: 'Acknowledged' })
    const alert = await db().getRepository(AlertEntity).findOneByOrFail({ taskId: task.id, kind: 'missed_task' })
    expect(alert.acknowledgedById).toBe(person.id)
    await expect.poll(async () => (await shownNotifications(worker)).map((n) => n.title)).toEqual(['Acknowledged'])

    // Open: the page goes to the task, which shows who answered.
    await worker.evaluate(async () => {
      const scope = globalThis as unknown as WorkerScope
      const [shown] = await scope.registration.getNotifications()
      await scope.roundtideNotificationClick(shown, 'open')
    })
    await page.waitForURL(`**/tasks/${task.id}`)
    await page.getByText(`Acknowledged by ${person.name} at`).waitFor()
    await screenshot(page, 'push-acknowledged-phone')
    await page.setViewportSize(DESKTOP)
    await page.goto('/settings')
    await page.getByRole('button', { name: 'Send alerts to this device' }).waitFor()
    await screenshot(page, 'push-settings-desktop')
    await context.close()
  })
})
