import { randomUUID } from 'node:crypto'
import { DateTime } from 'luxon'
import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { createPlaybook } from '#server/modules/playbooks/playbooks.service'
import type { Tank } from '#shared/schemas/facility'
import { PlaybookInputSchema } from '#shared/schemas/playbook'
import type { Task } from '#shared/schemas/task'
import { DESKTOP, PHONE, screenshot, type BrowserSession, startBrowserOnFacility } from '#tests/support/browser'
import { makeAreaWithTanks } from '#tests/support/facility-fixtures'
import { makeTankTask } from '#tests/support/task-fixtures'

let s: BrowserSession
let zone: string
beforeAll(async () => ({ s, zone } = await startBrowserOnFacility()))
afterAll(() => s?.close())

/** A routine-style feed on a tank at a facility wall time. */
function feedAt(tank: Tank, at: DateTime, title: string) {
  const local = at.toFormat("yyyy-MM-dd'T'HH:mm:ss")
  return makeTankTask(tank, {
    title,
    category: 'feeding',
    priority: 'routine',
    requiredReadings: ['feed_g'],
    status: 'planned',
    dueAt: at.toJSDate(),
    localDate: at.toISODate()!,
    localStart: local,
    occurrenceStart: local,
  })
}

const wallTime = (at: DateTime) =>
  new Intl.DateTimeFormat('en-GB', {
    weekday: 'short',
    day: 'numeric',
    month: 'short',
    hour: '2-digit',
    minute: '2-digit',
    hourCycle: 'h23',
    timeZone: zone,
  }).format(at.toJSDate())

async function arrange() {
  const tag = randomUUID().slice(0, 5).toUpperCase()
  const { tanks } = await makeAreaWithTanks(2)
  const start = DateTime.now().setZone(zone).plus({ days: 2 }).set({ hour: 10, minute: 0, second: 0, millisecond: 0 })
  const dayBefore = start.minus({ days: 1 })
  const feeds = {
    early: await feedAt(tanks[0], dayBefore.set({ hour: 8 }), `Morning feed ${tag}`), // 26 h before: outside the window
    inWindow: await feedAt(tanks[0], dayBefore.set({ hour: 14 }), `Afternoon feed ${tag}`), // 20 h before
    sameDay: await feedAt(tanks[0], start.set({ hour: 8 }), `Early feed ${tag}`), // 2 h before
    after: await feedAt(tanks[0], start.set({ hour: 16 }), `Evening feed ${tag}`), // after the start
    otherTank: await feedAt(tanks[1], start.set({ hour: 8 }), `Early feed ${tag} (other tank)`),
  }
  const playbook = await createPlaybook(
    PlaybookInputSchema.parse({
      name: `Grading ${tag}`,
      kind: 'grading',
      fastingHours: 24,
      description: 'Feed withheld before handling; checks before and after.',
      steps: [
        { title: 'Pre-handling check', category: 'welfare', minutesOffset: -60, perTank: true, durationMinutes: 3, requiredReadings: ['do_mgL', 'temp_c'] },
        { title: 'Grade and count', category: 'stock', minutesOffset: 0, perTank: true, durationMinutes: 40 },
        { title: 'Post-handling check', category: 'welfare', dayOffset: 1, time: '08:00', perTank: true, priority: 'welfare_critical' },
      ],
    }),
  )
  return { tag, tank: tanks[0], start, feeds, playbook }
}

describe('Events', () => {
  test('a supervisor starts a grading 2 days ahead; the fasting window holds that tank’s feeds on the board', async () => {
    const { tag, tank, start, feeds, playbook } = await arrange()
    const supervisor = await s.createPerson('supervisor')
    const { page, context } = await s.newPage(DESKTOP)
    await s.signIn(page, supervisor.email)
    await page.goto('/playbooks')
    const card = page.getByRole('article', { name: playbook.name })
    for (const words of ['−1 h', 'at the start', 'the next day at 08:00', 'Feeding held 24 h before']) await card.getByText(words).first().waitFor()

    await page.getByRole('button', { name: 'Start event' }).click()
    const form = page.getByRole('form', { name: 'Start event' })
    await form.getByLabel('Playbook').selectOption({ label: playbook.name })
    expect(await form.getByLabel('Title').inputValue()).toBe(playbook.name)
    const title = `Grading ${tag} tank 1`
    await form.getByLabel('Title').fill(title)
    await form.getByLabel('Starts (facility time)').fill(start.toFormat("yyyy-MM-dd'T'HH:mm"))
    expect(await form.getByLabel('Fasting before (hours)').inputValue()).toBe('24')
    await form.getByText('Common practice is 24 h for warm-water juveniles; follow your veterinarian and permit').waitFor()
    await form.getByRole('checkbox', { name: new RegExp(tank.code) }).check()
    const windowText = `Feeding held from ${wallTime(start.minus({ hours: 24 }))} to ${wallTime(start)}`
    await form.getByText(windowText).waitFor()
    await expect.poll(() => form.getByTestId('preview-total').textContent()).toMatch(/^3 tasks for 1 tank/)
    await screenshot(page, 'events-start-desktop')
    await form.getByRole('button', { name: 'Start event' }).click()

    await page.waitForURL(/\/events\/\d+$/)
    const eventId = Number(new URL(page.url()).pathname.split('/').pop())
    await page.getByRole('heading', { name: title }).waitFor()
    await page.getByText(windowText).waitFor()
    const heldRow = page.getByRole('listitem').filter({ hasText: feeds.sameDay.title }).filter({ hasNotText: 'other tank' })
    await heldRow.getByText('Held', { exact: true }).waitFor()
    await heldRow.getByText(`Fasting before ${title}`).waitFor()
    await page
      .getByRole('listitem')
      .filter({ hasText: `Grade and count · ${title}` })
      .waitFor()
    await screenshot(page, 'event-page-desktop')

    // The board for the event's day shows the held feed with its reason; the later feed and the other tank are untouched.
    await page.goto(`/board?date=${start.toISODate()}`)
    const boardCard = (id: number) => page.locator(`li[data-task-id="${id}"]`)
    await boardCard(feeds.sameDay.id).getByText(`Held: Fasting before ${title}`).waitFor()
    await boardCard(feeds.after.id).waitFor()
    expect(await boardCard(feeds.after.id).textContent()).not.toMatch(/Held/)
    expect(await boardCard(feeds.otherTank.id).textContent()).not.toMatch(/Held/)
    await screenshot(page, 'events-board-held-desktop')

    const day = async (date: DateTime) => (await (await page.request.get(`/api/tasks?date=${date.toISODate()}`)).json()) as Task[]
    const byId = new Map([...(await day(start)), ...(await day(start.minus({ days: 1 })))].map((t) => [t.id, t]))
    expect(byId.get(feeds.inWindow.id)).toMatchObject({ status: 'held', heldReason: `Fasting before ${title}` })
    expect(byId.get(feeds.sameDay.id)).toMatchObject({ status: 'held', heldReason: `Fasting before ${title}` })
    expect(byId.get(feeds.early.id)?.status).toBe('planned')
    expect(byId.get(feeds.after.id)?.status).toBe('planned')
    expect(byId.get(feeds.otherTank.id)?.status).toBe('planned')

    // On a phone the event list and the event read well; ending the event gives the feeds back.
    const phone = await s.newPage(PHONE)
    await s.signIn(phone.page, supervisor.email)
    await phone.page.goto('/playbooks')
    await phone.page.getByRole('listitem', { name: title }).getByText(windowText).waitFor()
    await screenshot(phone.page, 'events-list-phone')
    await phone.page.goto(`/events/${eventId}`)
    await phone.page.getByRole('button', { name: `End ${title}` }).click()
    await phone.page.getByRole('button', { name: 'Yes, end event' }).click()
    await phone.page.getByText('Ended', { exact: true }).first().waitFor()
    await screenshot(phone.page, 'event-ended-phone')
    const released = (await day(start)).find((t) => t.id === feeds.sameDay.id)
    expect(released).toMatchObject({ status: 'planned', heldReason: null })
    await phone.context.close()
    await context.close()
  })
})
