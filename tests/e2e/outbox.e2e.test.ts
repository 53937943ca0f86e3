import { randomUUID } from 'node:crypto'
import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { db } from '#server/db/data-source'
import { advanceTaskStatuses } from '#server/jobs/status-clock'
import { deliverPending } from '#server/modules/escalation/deliver'
import { runEscalations } from '#server/modules/escalation/escalate'
import { OnCallEntity } from '#server/modules/roster/roster.entities'
import { PersonEntity } from '#server/modules/people/person.entity'
import { createPushSender } from '#server/push/push-client'
import { DESKTOP, PHONE, screenshot, startBrowserSession, type BrowserSession } from '#tests/support/browser'
import { ensureFacilityAndParameters, makeAreaWithTanks } from '#tests/support/facility-fixtures'
import { messagesTo, startMailCatcher } from '#tests/support/mail-fixtures'
import { makeTankTask } from '#tests/support/task-fixtures'

const MIN = 60_000
let s: BrowserSession
let mail: Awaited<ReturnType<typeof startMailCatcher>>
beforeAll(async () => {
  s = await startBrowserSession()
  await ensureFacilityAndParameters()
  // Links in the mail point at the browser-test server, as they would at a real deployment's address.
  mail = await startMailCatcher({ ...s.config, publicUrl: s.url })
})
afterAll(async () => {
  await mail?.close()
  await s?.close()
})

describe('the outbox in local mail mode', () => {
  test('a manager reads the escalation mail for a missed welfare-critical task, follows its acknowledge link, and the task shows who answered', async () => {
    const manager = await s.createPerson('manager', { name: 'Oriel Brackett' })
    const { tanks } = await makeAreaWithTanks(1)
    const title = `Nursery DO check ${randomUUID().slice(0, 4)}`
    const now = Date.now()
    const task = await makeTankTask(tanks[0], {
      title,
      assigneeId: manager.id,
      status: 'overdue',
      dueAt: new Date(now - 61 * MIN),
      graceUntil: new Date(now - MIN),
    })
    // The test server's scheduler ticks only every 30 s; run its three steps now.
    await advanceTaskStatuses(db(), new Date())
    await runEscalations(new Date())
    await deliverPending(mail.config, mail.transport, new Date())
    await expect.poll(async () => (await messagesTo(manager.email)).length).toBeGreaterThan(0)

    const { page, context } = await s.newPage(DESKTOP)
    await s.signIn(page, manager.email)
    await page.goto('/outbox')
    const item = page.getByRole('link', { name: new RegExp(`^MISSED: ${title} at `) })
    await item.click()
    const message = page.getByRole('article', { name: new RegExp(`^MISSED: ${title}`) })
    await message.getByText(`Task: ${title}`).waitFor()
    const html = message.getByTitle(new RegExp(`^HTML part of MISSED: ${title}`))
    expect(await html.getAttribute('sandbox')).toBe('')
    await message.frameLocator('iframe').getByRole('link', { name: 'Acknowledge' }).waitFor()
    const ack = message.getByRole('link', { name: 'Open acknowledge link' })
    const href = (await ack.getAttribute('href'))!
    expect(href).toMatch(/\/ack\/[\w.-]+$/)
    await screenshot(page, 'outbox-desktop')

    // Its path, not its host: a scheduler tick of the test server may have sent it with the default public address.
    await page.goto(new URL(href).pathname)
    await page.getByRole('heading', { name: 'Acknowledge this escalation?' }).waitFor()
    await page.getByRole('button', { name: 'Acknowledge' }).click()
    await page.getByRole('heading', { name: 'Acknowledged' }).waitFor()
    await page.getByRole('link', { name: 'Open the task' }).click()

    await page.waitForURL(`**/tasks/${task.id}`)
    await page.getByRole('heading', { name: title }).waitFor()
    await page.getByText(`Acknowledged by ${manager.name} at`).waitFor()
    await page.getByText('Missed', { exact: true }).first().waitFor()
    await screenshot(page, 'task-desktop')
    await context.close()

    const phone = await s.newPage(PHONE)
    await s.signIn(phone.page, manager.email)
    await phone.page.goto(`/tasks/${task.id}`)
    await phone.page.getByText(`Acknowledged by ${manager.name} at`).waitFor()
    await screenshot(phone.page, 'task-phone')
    await phone.page.goto('/outbox')
    await phone.page.getByRole('link', { name: new RegExp(`^MISSED: ${title} at `) }).click()
    await phone.page.getByRole('link', { name: 'Open acknowledge link' }).waitFor()
    await phone.page.frameLocator('iframe').getByRole('link', { name: 'Acknowledge' }).waitFor()
    // Chromium paints a frame below the first screen only once it has been scrolled to.
    await phone.page.locator('iframe').scrollIntoViewIfNeeded()
    await screenshot(phone.page, 'outbox-phone')
    await phone.context.close()
  })
})

describe('push notifications in the Outbox (local push mode)', () => {
  test('the server started the local push service; a manager adds a stand-in device and reads the alert it decrypted, on a phone and a desktop', async () => {
    expect(s.config.push.localUrl).toMatch(/^http:\/\/127\.0\.0\.1:\d+$/)
    const manager = await s.createPerson('manager', { name: 'Maren Tollis', onCallEligible: true })
    const now = Date.now()
    await db()
      .getRepository(PersonEntity)
      .update(manager.id, { channels: ['push'] })
    await db()
      .getRepository(OnCallEntity)
      .save({ personId: manager.id, fromDate: '2000-01-01', toDate: '2000-01-02', startsAt: new Date(now - 60 * MIN), endsAt: new Date(now + 600 * MIN) })

    const { page, context } = await s.newPage(PHONE)
    await s.signIn(page, manager.email)
    await page.goto('/outbox')
    await page.getByText('No push notifications have been sent yet.').waitFor()
    await screenshot(page, 'push-outbox-empty-phone')
    await page.getByRole('button', { name: 'Add a stand-in device for me' }).click()
    await page.getByText('A stand-in device now receives your push alerts.').waitFor()

    const { tanks } = await makeAreaWithTanks(1)
    const title = `Fry tank DO ${randomUUID().slice(0, 4)}`
    await makeTankTask(tanks[0], { title, priority: 'welfare_critical', status: 'overdue', dueAt: new Date(now - 61 * MIN), graceUntil: new Date(now - MIN) })
    await advanceTaskStatuses(db(), new Date())
    await runEscalations(new Date())
    await deliverPending(mail.config, mail.transport, new Date(), { push: createPushSender(s.config) })

    await page.reload()
    const pushes = page.getByRole('list', { name: 'Push notifications' })
    const item = pushes.getByRole('listitem').filter({ hasText: `MISSED: ${title}` })
    await item.waitFor()
    expect(await item.textContent()).toMatch(/^Decrypted · To Maren Tollis · /)
    await item.scrollIntoViewIfNeeded()
    await screenshot(page, 'push-outbox-phone')
    await page.setViewportSize(DESKTOP)
    await screenshot(page, 'push-outbox-desktop')
    await context.close()
  })

  test('when the push list cannot load, the Outbox says so with a retry and the mail stays readable', async () => {
    const manager = await s.createPerson('manager')
    const { page, context } = await s.newPage(PHONE)
    await s.signIn(page, manager.email)
    await page.route('**/api/outbox/pushes', (route) =>
      route.fulfill({
        status: 500,
        contentType: 'application/json',
        body: JSON.stringify({ error: { code: 'internal', message: 'The server could not answer.' } }),
      }),
    )
    await page.goto('/outbox')
    await page.getByText('Could not load the push notifications').waitFor()
    await page.getByRole('button', { name: 'Try again' }).waitFor()
    await page.getByText('Local mail mode: the e-mail Roundtide sent is kept here').waitFor()
    await screenshot(page, 'push-outbox-error-phone')
    await context.close()
  })
})
