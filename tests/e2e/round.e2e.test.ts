import { DateTime } from 'luxon'
import type { Page } from 'playwright-core'
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { db } from '#server/db/data-source'
import { CompletionEntity, PhotoEntity } from '#server/modules/completions/completion.entities'
import { TEST_PASSWORD } from '#seed/factories'
import type { Tank } from '#shared/schemas/facility'
import { DESKTOP, PHONE, screenshot, type BrowserSession, startBrowserOnFacility } from '#tests/support/browser'
import { makeAreaWithTanks } from '#tests/support/facility-fixtures'
import { completion, makeTankTask, setSystemLimit } from '#tests/support/task-fixtures'

let s: BrowserSession
let zone: string
beforeAll(async () => ({ s, zone } = await startBrowserOnFacility()))
afterAll(() => s?.close())

/** A task on the facility's today, due `minutes` from now, so it sits on today's round. */
function taskDueIn(tank: Tank, minutes: number, extra: Parameters<typeof makeTankTask>[1] = {}) {
  const due = DateTime.now().plus({ minutes }).setZone(zone)
  return makeTankTask(tank, {
    dueAt: due.toJSDate(),
    localDate: due.toISODate()!,
    localStart: due.toFormat("yyyy-MM-dd'T'HH:mm:ss"),
    ...extra,
  })
}

const TINY_PNG = Buffer.from('iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR4nGNgaPj/HwADgQJ/lmA8RwAAAABJRU5ErkJggg==', 'base64')

/** What the phone shows right now (the full-page shots stretch the sticky header mid-scroll). */
const viewShot = (page: Page, name: string) => page.screenshot({ path: `test-results/${name}.png` })

async function signInAs(email: string) {
  const agent = request.agent(s.url)
  await agent.post('/api/session').send({ email, password: TEST_PASSWORD }).expect(200)
  return agent
}

const row = (page: Page, title: string) => page.getByRole('button', { name: new RegExp(`^\\d\\d:\\d\\d ${title} `) })
/** Opens a task unless it is open already (the round opens the first task due by itself). */
async function openTask(page: Page, title: string) {
  const button = row(page, title)
  await button.waitFor()
  if ((await button.getAttribute('aria-expanded')) !== 'true') await button.click()
}
const doneButton = (page: Page) => page.getByRole('button', { name: 'Done', exact: true })

describe('the round on a phone', () => {
  test('a technician walks three tasks, flags a low DO with a recheck, and completes one offline that is sent once back online', async () => {
    const tech = await s.createPerson('technician')
    const { area, system, tanks } = await makeAreaWithTanks(3, { roundOrder: 1 })
    // The demo's facility limits, pinned on this system: another test file may have made the parameters without them.
    await setSystemLimit(system.id, 'do_mgL', { okMin: 5, okMax: 10.5, criticalMin: 4, criticalMax: null })
    await setSystemLimit(system.id, 'temp_c', { okMin: 26.5, okMax: 31, criticalMin: 24, criticalMax: 33 })
    const [t1, t2, t3] = await Promise.all(
      tanks.map((tank, i) =>
        taskDueIn(tank, 10 + i * 5, { title: `Water check ${i + 1}`, assigneeId: tech.id, instructions: 'Read DO and temperature at the outlet.' }),
      ),
    )
    const { page, context } = await s.newPage(PHONE)
    await s.signIn(page, tech.email)
    await page.waitForURL('**/round')
    const section = page.getByRole('region', { name: area.name })
    await section.getByText('Tank 1').first().waitFor()
    await page.getByText('0 of 3 done').waitFor()
    await page.getByRole('status', { name: 'Connection: Live' }).waitFor()
    await screenshot(page, 'round-phone-start')

    // Task 1: tap, type two readings, tap Done.
    await openTask(page, 'Water check 1')
    await page.getByLabel('Dissolved oxygen').fill('6.8')
    await page.getByLabel('Temperature').fill('28.4')
    await page.getByText('DO saturation').waitFor()
    await viewShot(page, 'round-phone-typing-ok')
    await doneButton(page).click()
    await page.getByText('1 of 3 done').waitFor()

    // Done advanced to task 2 on its own: its first field has the focus.
    await expect.poll(() => page.evaluate(() => document.activeElement?.getAttribute('inputmode'))).toBe('decimal')
    await page.getByLabel('Dissolved oxygen').fill('3.2')
    await page.getByText('below 4 mg/L').waitFor()
    await page.getByLabel('Temperature').fill('28')
    await viewShot(page, 'round-phone-typing-critical')
    await doneButton(page).click()
    await page.getByText('Flag: Critical').first().waitFor()
    await page.getByText(/^Recheck due at \d\d:\d\d$/).waitFor()
    await row(page, 'Recheck: Water check 2').waitFor()
    await page.getByText('2 of 4 done').waitFor()
    await viewShot(page, 'round-phone-flagged')

    // Task 3 with the network cut: kept on the phone, then sent when the network is back.
    await context.setOffline(true)
    await page.getByRole('status', { name: 'Connection: Offline' }).waitFor()
    await openTask(page, 'Water check 3')
    await page.getByLabel('Dissolved oxygen').fill('7.1')
    await page.getByLabel('Temperature').fill('27.9')
    await doneButton(page).click()
    await row(page, 'Water check 3').getByText('Waiting to send').waitFor()
    await page.getByText('1 waiting to send').waitFor()
    await viewShot(page, 'round-phone-offline-queued')
    expect(await db().getRepository(CompletionEntity).countBy({ taskId: t3.id })).toBe(0)

    await context.setOffline(false)
    await page.getByText('3 of 4 done').waitFor({ timeout: 15_000 })
    await expect.poll(() => row(page, 'Water check 3').textContent()).toContain('Done')
    // The queue badge clears once the outbox has drained, a moment after the row turns Done.
    await expect.poll(() => page.getByText('waiting to send').count()).toBe(0)
    await page.getByRole('status', { name: 'Connection: Live' }).waitFor()
    await screenshot(page, 'round-phone-sent')

    expect(await db().getRepository(CompletionEntity).countBy({ taskId: t3.id })).toBe(1)
    expect(await db().getRepository(CompletionEntity).countBy({ taskId: t1.id })).toBe(1)
    expect(await db().getRepository(CompletionEntity).countBy({ taskId: t2.id })).toBe(1)
    await context.close()
  })

  test('changes by other people show up without a reload: a supervisor completes my task, a colleague takes a shared one', async () => {
    const me = await s.createPerson('technician')
    const colleague = await s.createPerson('technician')
    const supervisor = await s.createPerson('supervisor', { name: 'Marla Supervisor' })
    const { tanks } = await makeAreaWithTanks(2, { roundOrder: 2 })
    const mine = await taskDueIn(tanks[0], 20, { title: 'Feed check', assigneeId: me.id, requiredReadings: ['temp_c'] })
    await taskDueIn(tanks[1], 25, { title: 'Shared DO check', assigneeId: null })

    const mePage = await s.newPage(DESKTOP)
    await s.signIn(mePage.page, me.email)
    await row(mePage.page, 'Shared DO check').waitFor()
    await mePage.page.getByRole('status', { name: 'Connection: Live' }).waitFor()
    await screenshot(mePage.page, 'round-desktop')

    const other = await s.newPage(PHONE)
    await s.signIn(other.page, colleague.email)
    await other.page.getByRole('button', { name: 'Unassigned — take it' }).click()
    await other.page.getByText('Unassigned').waitFor({ state: 'detached' })
    // On my screen the task left my round: it is my colleague's now.
    await row(mePage.page, 'Shared DO check').waitFor({ state: 'detached' })

    // While my form is open: a photo goes up at once, then the supervisor completes the task.
    await openTask(mePage.page, 'Feed check')
    await mePage.page.locator('input[type=file]').setInputFiles({ name: 'tank.png', mimeType: 'image/png', buffer: TINY_PNG })
    await mePage.page.getByText('Photo added').waitFor()
    expect(await db().getRepository(PhotoEntity).countBy({ taskId: mine.id })).toBe(1)
    const agent = await signInAs(supervisor.email)
    await agent
      .post(`/api/tasks/${mine.id}/completion`)
      .send(completion({ temp_c: 28.1 }))
      .expect(200)
    await expect.poll(() => row(mePage.page, 'Feed check').textContent()).toContain('Done')
    await mePage.page.getByText('Done by Marla Supervisor').waitFor()
    await other.context.close()
    await mePage.context.close()
  })

  test('when the live-feed code fails to arrive, it is fetched again once the network is back, and what changed meanwhile shows', async () => {
    const tech = await s.createPerson('technician')
    const supervisor = await s.createPerson('supervisor', { name: 'Pell Supervisor' })
    const { tanks } = await makeAreaWithTanks(1, { roundOrder: 5 })
    const task = await taskDueIn(tanks[0], 35, { title: 'Late DO check', assigneeId: tech.id, requiredReadings: ['temp_c'] })
    const { page, context } = await s.newPage(PHONE)
    // The socket's code is loaded once the page is idle; here its first fetch fails, as on a phone
    // that lost the network just then.
    let refused = 0
    await page.route('**/assets/socket-client-*.js', (route) => (refused++ === 0 ? route.abort('internetdisconnected') : route.continue()))
    await s.signIn(page, tech.email)
    await page.getByRole('status', { name: 'Connection: Offline' }).waitFor()
    const agent = await signInAs(supervisor.email)
    await agent
      .post(`/api/tasks/${task.id}/completion`)
      .send(completion({ temp_c: 27.9 }))
      .expect(200)
    await context.setOffline(true)
    await context.setOffline(false)
    await page.getByRole('status', { name: 'Connection: Live' }).waitFor()
    await openTask(page, 'Late DO check')
    await page.getByText('Done by Pell Supervisor').waitFor()
    expect(refused).toBe(2)
    await context.close()
  })

  test('a queued completion that someone else beat is kept on the task, with who and when, until dismissed', async () => {
    const tech = await s.createPerson('technician')
    const supervisor = await s.createPerson('supervisor', { name: 'Odile Supervisor' })
    const { tanks } = await makeAreaWithTanks(1, { roundOrder: 3 })
    const task = await taskDueIn(tanks[0], 15, { title: 'Evening temperature', assigneeId: tech.id, requiredReadings: ['temp_c'] })
    const { page, context } = await s.newPage(PHONE)
    await s.signIn(page, tech.email)
    await context.setOffline(true)
    await openTask(page, 'Evening temperature')
    await page.getByLabel('Temperature').fill('27.5')
    await doneButton(page).click()
    await page.getByText('1 waiting to send').waitFor()

    const agent = await signInAs(supervisor.email)
    await agent
      .post(`/api/tasks/${task.id}/completion`)
      .send(completion({ temp_c: 28.0 }))
      .expect(200)
    await context.setOffline(false)
    await page.getByText('1 not sent').waitFor({ timeout: 15_000 })
    await openTask(page, 'Evening temperature')
    await page.getByRole('alert').filter({ hasText: 'Odile Supervisor already finished this task' }).waitFor()
    await page.getByText('Done by Odile Supervisor').waitFor()
    await viewShot(page, 'round-phone-conflict')
    await page.getByRole('button', { name: 'Dismiss' }).click()
    await page.getByText('1 not sent').waitFor({ state: 'detached' })
    expect(await db().getRepository(CompletionEntity).countBy({ taskId: task.id })).toBe(1)
    await context.close()
  })

  test('with the service worker allowed, a round opened once opens again with the network cut', async () => {
    const tech = await s.createPerson('technician')
    const { tanks } = await makeAreaWithTanks(1, { roundOrder: 4 })
    await taskDueIn(tanks[0], 30, { title: 'Night feed', assigneeId: tech.id, requiredReadings: [] })
    // The other tests block service workers (see tests/support/browser.ts); this one needs it.
    const context = await s.newContext({ viewport: PHONE, serviceWorkers: 'allow' })
    const page = await context.newPage()
    await s.signIn(page, tech.email)
    await row(page, 'Night feed').waitFor()
    await page.evaluate(() => navigator.serviceWorker.ready.then(() => undefined))
    // Load once under the worker's control, so the round and the person pass through its runtime cache.
    await page.reload()
    await expect.poll(() => page.evaluate(() => Boolean(navigator.serviceWorker.controller))).toBe(true)
    await row(page, 'Night feed').waitFor()

    await context.setOffline(true)
    await page.reload()
    await row(page, 'Night feed').waitFor()
    await page.getByRole('status', { name: 'Connection: Offline' }).waitFor()
    await viewShot(page, 'round-phone-opened-offline')
    await context.close()
  })
})
