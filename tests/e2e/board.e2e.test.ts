import { randomUUID } from 'node:crypto'
import { DateTime } from 'luxon'
import type { Locator, Page } from 'playwright-core'
import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { db } from '#server/db/data-source'
import { createShift } from '#server/modules/roster/roster.service'
import { TaskEntity } from '#server/modules/tasks/task.entity'
import type { Tank } from '#shared/schemas/facility'
import type { Task } from '#shared/schemas/task'
import { DESKTOP, PHONE, screenshot, type BrowserSession, startBrowserOnFacility } from '#tests/support/browser'
import { makeAreaWithTanks } from '#tests/support/facility-fixtures'
import { makeTankTask } from '#tests/support/task-fixtures'

const TABLET = { width: 820, height: 1180 }
/** A day long enough that a column draws only a window of its cards. */
const CARDS = 400

let s: BrowserSession
let zone: string
beforeAll(async () => ({ s, zone } = await startBrowserOnFacility()))
afterAll(() => s?.close())

/** A task on a facility day at a local time, unassigned unless told. */
function taskAt(tank: Tank, date: string, time: string, extra: Parameters<typeof makeTankTask>[1] = {}) {
  const due = DateTime.fromISO(`${date}T${time}`, { zone })
  return makeTankTask(tank, {
    dueAt: due.toJSDate(),
    localDate: date,
    localStart: `${date}T${time}:00`,
    occurrenceStart: `${date}T${time}:00`,
    status: 'planned',
    ...extra,
  })
}

/** A Monday far ahead, so other journeys' tasks never share the board; Tuesday is in the same week. */
async function arrange() {
  const tag = randomUUID().slice(0, 5)
  const monday = DateTime.now().setZone(zone).plus({ days: 320 }).startOf('week').toISODate()!
  const tuesday = DateTime.fromISO(monday).plus({ days: 1 }).toISODate()!
  const { area, tanks } = await makeAreaWithTanks(4)
  const tech = await s.createPerson('technician', { name: `Ana Kowal ${tag}` })
  const offShift = await s.createPerson('technician', { name: `Rui Duarte ${tag}` })
  await createShift({ personId: tech.id, date: monday, start: '07:00', end: '15:30', kind: 'day' })
  const [mouse, keyboard, dayMove, refused, bulkA, bulkB] = await Promise.all([
    taskAt(tanks[0], monday, '07:30', { title: `Morning feed ${tag}`, category: 'feeding', priority: 'routine' }),
    taskAt(tanks[1], monday, '08:00', { title: `Tank check ${tag}` }),
    taskAt(tanks[2], monday, '09:00', { title: `Filter rinse ${tag}`, category: 'maintenance', priority: 'routine' }),
    taskAt(tanks[3], monday, '10:00', { title: `Afternoon feed ${tag}`, category: 'feeding', priority: 'routine' }),
    taskAt(tanks[0], monday, '11:00', { title: `Water test A ${tag}`, category: 'water_quality', priority: 'routine' }),
    taskAt(tanks[1], monday, '11:15', { title: `Water test B ${tag}`, category: 'water_quality', priority: 'routine' }),
    // Neighbours that show the card's other facts: a held feed, and a finished check with a watch flag.
    taskAt(tanks[2], monday, '12:00', {
      title: `Fasted feed ${tag}`,
      category: 'feeding',
      status: 'held',
      heldReason: 'Fasting before dispatch',
      assigneeId: offShift.id,
    }),
    taskAt(tanks[3], monday, '06:30', { title: `Dawn check ${tag}`, status: 'done', flag: 'watch', assigneeId: tech.id }),
  ])
  return { tag, monday, tuesday, area, tech, offShift, tasks: { mouse, keyboard, dayMove, refused, bulkA, bulkB } }
}

const column = (page: Page, name: string) => page.getByRole('region', { name, exact: true })
const card = (page: Page, taskId: number) => page.locator(`li[data-task-id="${taskId}"]`)
const liveRegion = (page: Page) => page.locator('[id^="DndLiveRegion"]')

async function mouseDrag(page: Page, from: Locator, to: Locator) {
  const a = (await from.boundingBox())!
  const b = (await to.boundingBox())!
  await page.mouse.move(a.x + a.width / 2, a.y + 16)
  await page.mouse.down()
  await page.mouse.move(a.x + a.width / 2 + 12, a.y + 24, { steps: 4 })
  await page.mouse.move(b.x + b.width / 2, b.y + Math.min(b.height / 2, 60), { steps: 12 })
  // The board may scroll itself while a card is held near an edge: aim again at where the target is now.
  const c = (await to.boundingBox())!
  await page.mouse.move(c.x + c.width / 2, c.y + Math.min(c.height / 2, 60), { steps: 3 })
  await page.mouse.up()
}

async function apiTask(page: Page, id: number): Promise<Task> {
  const res = await page.request.get(`/api/tasks/${id}`)
  expect(res.status()).toBe(200)
  return (await res.json()) as Task
}

describe('the board', () => {
  test('a supervisor assigns by mouse and keyboard, moves a card to Tuesday, drags two together, and sees a refusal explained; the technician sees it live', async () => {
    const { monday, tuesday, area, tech, offShift, tasks } = await arrange()
    const boardUrl = `/board?date=${monday}&area=${area.id}`
    const tuesdayName = DateTime.fromISO(tuesday).setLocale('en-GB').toFormat('cccc d MMMM')

    // The technician keeps two rounds open: Monday's and Tuesday's.
    const techSide = await s.newPage(PHONE)
    await s.signIn(techSide.page, tech.email)
    const mondayRound = techSide.page
    await mondayRound.goto(`/round?date=${monday}`)
    await mondayRound.getByRole('status', { name: 'Connection: Live' }).waitFor()
    const tuesdayRound = await techSide.context.newPage()
    await tuesdayRound.goto(`/round?date=${tuesday}`)
    await tuesdayRound.getByRole('status', { name: 'Connection: Live' }).waitFor()
    const roundRow = (page: Page, title: string) => page.getByRole('listitem').filter({ has: page.getByRole('button', { name: new RegExp(title) }) })
    await roundRow(mondayRound, tasks.mouse.title).getByRole('button', { name: 'Unassigned — take it' }).waitFor()
    expect(await tuesdayRound.getByText(tasks.dayMove.title).count()).toBe(0)

    const supervisor = await s.createPerson('supervisor')
    const { page, context } = await s.newPage(DESKTOP)
    const errors: string[] = []
    // The refused move answers 409, which the browser logs as a failed resource; anything else is a fault.
    page.on('console', (m) => m.type() === 'error' && !/status of 409/.test(m.text()) && errors.push(m.text()))
    await s.signIn(page, supervisor.email)
    await page.goto(boardUrl)
    const unassigned = column(page, 'Unassigned')
    const techColumn = column(page, tech.name)
    await card(page, tasks.mouse.id).waitFor()
    await techColumn.getByText('07:00–15:30').waitFor()
    await column(page, offShift.name).getByText('Not on shift').waitFor()
    await column(page, offShift.name).getByText('Held: Fasting before dispatch').waitFor()
    await techColumn.getByText('Flag: watch').waitFor()
    await screenshot(page, 'board-desktop-start')

    // Mouse: Unassigned -> the technician.
    await mouseDrag(page, card(page, tasks.mouse.id), techColumn)
    await techColumn.locator(`li[data-task-id="${tasks.mouse.id}"]`).waitFor()
    await expect.poll(() => liveRegion(page).textContent()).toContain(`assigned to ${tech.name}`)
    // Live on the technician's phone: the card is theirs now, no longer up for taking.
    await expect.poll(() => roundRow(mondayRound, tasks.mouse.title).getByRole('button', { name: 'Unassigned — take it' }).count()).toBe(0)
    await roundRow(mondayRound, tasks.mouse.title).waitFor()

    // Keyboard: space picks up, the right arrow reaches the next column, space drops.
    const handle = page.getByRole('button', { name: new RegExp(`^Move ${tasks.keyboard.title}, `) })
    await handle.focus()
    await page.keyboard.press('Space')
    await expect.poll(() => liveRegion(page).textContent()).toMatch(new RegExp(`^Picked up ${tasks.keyboard.title}, .+ at 08:00\\.$`))
    await settleKeyboardDrag(page)
    await page.keyboard.press('ArrowRight')
    await expect.poll(() => liveRegion(page).textContent()).toBe(`Over ${tech.name}'s column.`)
    // Viewport only: a full-page shot resizes the window, and a resize cancels a keyboard drag.
    await page.screenshot({ path: 'test-results/board-desktop-keyboard-drag.png' })
    await page.keyboard.press('Space')
    await techColumn.locator(`li[data-task-id="${tasks.keyboard.id}"]`).waitFor()
    await expect.poll(() => liveRegion(page).textContent()).toBe(`${tasks.keyboard.title} assigned to ${tech.name}.`)

    // Up reaches the week strip (the nearest day that takes cards), down comes back; escape puts the card back.
    await page.getByRole('button', { name: new RegExp(`^Move ${tasks.refused.title}, `) }).focus()
    await page.keyboard.press('Space')
    await expect.poll(() => liveRegion(page).textContent()).toContain('Picked up')
    await settleKeyboardDrag(page)
    await page.keyboard.press('ArrowUp')
    await expect.poll(() => liveRegion(page).textContent()).toBe(`Over ${tuesdayName}.`)
    await page.keyboard.press('ArrowRight')
    await expect.poll(() => liveRegion(page).textContent()).toMatch(/^Over Wednesday /)
    await page.keyboard.press('ArrowDown')
    await expect.poll(() => liveRegion(page).textContent()).toMatch(/^Over (Unassigned|.+'s column)\.$/)
    await page.keyboard.press('Escape')
    await expect.poll(() => liveRegion(page).textContent()).toContain('stays where it was')
    await unassigned.locator(`li[data-task-id="${tasks.refused.id}"]`).waitFor()

    // Week strip: onto Tuesday, which leaves Monday's board and shows up in Tuesday's round.
    const tuesdayLink = page.getByRole('link', { name: tuesdayName, exact: true })
    await mouseDrag(page, card(page, tasks.dayMove.id), tuesdayLink)
    await card(page, tasks.dayMove.id).waitFor({ state: 'detached' })
    await expect.poll(async () => (await apiTask(page, tasks.dayMove.id)).localDate).toBe(tuesday)
    await tuesdayRound.getByText(tasks.dayMove.title).waitFor()

    // Two selected cards travel together (one bulk move).
    await page.getByRole('checkbox', { name: new RegExp(`^Select ${tasks.bulkA.title}, `) }).check()
    await card(page, tasks.bulkB.id).click({ modifiers: ['Shift'] })
    await page.getByText('2 selected').waitFor()
    const bulk = page.waitForRequest((r) => r.url().endsWith('/api/tasks/bulk-move') && r.method() === 'POST')
    await mouseDrag(page, card(page, tasks.bulkA.id), techColumn)
    await bulk
    await techColumn.locator(`li[data-task-id="${tasks.bulkA.id}"]`).waitFor()
    await techColumn.locator(`li[data-task-id="${tasks.bulkB.id}"]`).waitFor()

    // Refused: the other technician is not on shift that day; the card goes back and the reason shows.
    await mouseDrag(page, card(page, tasks.refused.id), column(page, offShift.name))
    await page.getByText(`${offShift.name} is not on shift on ${monday}`).waitFor()
    await unassigned.locator(`li[data-task-id="${tasks.refused.id}"]`).waitFor()
    await screenshot(page, 'board-desktop-refused')

    // After a reload the assignments hold, on screen and in the API.
    await page.reload()
    for (const t of [tasks.mouse, tasks.keyboard, tasks.bulkA, tasks.bulkB]) {
      await techColumn.locator(`li[data-task-id="${t.id}"]`).waitFor()
      expect((await apiTask(page, t.id)).assigneeId).toBe(tech.id)
    }
    expect((await apiTask(page, tasks.refused.id)).assigneeId).toBeNull()
    await techColumn.getByText('5 tasks').waitFor()
    await screenshot(page, 'board-desktop-after')

    expect(errors).toEqual([])
    await page.setViewportSize(TABLET)
    await techColumn.waitFor()
    await screenshot(page, 'board-tablet')
    await context.close()

    // The technician reads the same board on the phone, without handles or checkboxes.
    await mondayRound.goto(boardUrl)
    await column(mondayRound, tech.name).locator(`li[data-task-id="${tasks.mouse.id}"]`).waitFor()
    await mondayRound.getByText('You can read this board').waitFor()
    expect(await mondayRound.getByRole('button', { name: /^Move / }).count()).toBe(0)
    expect(await mondayRound.getByRole('checkbox').count()).toBe(0)
    await screenshot(mondayRound, 'board-phone-read-only')
    await techSide.context.close()
  })

  test('without a date the board opens on the facility today, and the filters narrow the cards', async () => {
    const { monday, area, tasks } = await arrange()
    const observer = await s.createPerson('observer')
    const { page, context } = await s.newPage(DESKTOP)
    await s.signIn(page, observer.email)
    await page.goto('/board')
    await page.waitForURL(/\/board\?date=\d{4}-\d{2}-\d{2}$/)
    expect(new URL(page.url()).searchParams.get('date')).toBe(DateTime.now().setZone(zone).toISODate())

    await page.goto(`/board?date=${monday}`)
    await page.getByLabel('Area').selectOption(String(area.id))
    await page.getByLabel('Category').selectOption('water_quality')
    await card(page, tasks.bulkA.id).waitFor()
    await card(page, tasks.mouse.id).waitFor({ state: 'detached' })
    expect(new URL(page.url()).searchParams.get('category')).toBe('water_quality')
    await page.getByRole('button', { name: 'Clear filters' }).click()
    await card(page, tasks.mouse.id).waitFor()
    await page.getByRole('link', { name: 'Next day' }).click()
    await page.waitForURL(`**/board?date=${DateTime.fromISO(monday).plus({ days: 1 }).toISODate()}`)
    await context.close()
  })
})

/** dnd-kit's keyboard sensor starts listening for arrows a tick after the pick-up is announced. */
async function settleKeyboardDrag(page: import('playwright-core').Page) {
  await page.waitForTimeout(200)
}

/** A long day for one technician: four hundred feeds, one a minute from 06:00, in one insert. */
async function longDay() {
  const { area, tanks } = await makeAreaWithTanks(4)
  const date = DateTime.now().setZone(zone).plus({ days: 340 }).startOf('week').toISODate()!
  const tech = await s.createPerson('technician', { name: 'Noor Haddad' })
  await createShift({ personId: tech.id, date, start: '06:00', end: '14:00', kind: 'day' })
  const start = DateTime.fromISO(`${date}T06:00`, { zone })
  const rows = Array.from({ length: CARDS }, (_, i) => {
    const due = start.plus({ minutes: i })
    const tank = tanks[i % tanks.length]
    const local = due.toFormat("yyyy-MM-dd'T'HH:mm:ss")
    return {
      routineId: null,
      eventId: null,
      title: `Feed ${String(i + 1).padStart(3, '0')}`,
      category: 'feeding' as const,
      instructions: '',
      priority: 'routine' as const,
      targetKind: 'tank' as const,
      targetId: tank.id,
      tankId: tank.id,
      areaId: area.id,
      localDate: date,
      localStart: local,
      occurrenceStart: local,
      dueAt: due.toJSDate(),
      windowStartAt: due.minus({ minutes: 30 }).toJSDate(),
      graceUntil: due.plus({ hours: 1 }).toJSDate(),
      durationMinutes: 2,
      status: 'planned' as const,
      assigneeId: tech.id,
      assignedManually: true,
      edited: false,
      requiredReadings: [],
      version: 1,
    }
  })
  await db().getRepository(TaskEntity).insert(rows)
  const saved = await db()
    .getRepository(TaskEntity)
    .find({ where: { localDate: date, assigneeId: tech.id }, order: { dueAt: 'ASC' } })
  return { date, area, tech, tasks: saved }
}

describe('a full day on the board', () => {
  test('a supervisor sees all four hundred of a technician’s cards counted, scrolls to the last and drags it to Unassigned', async () => {
    const { date, area, tech, tasks } = await longDay()
    const supervisor = await s.createPerson('supervisor')
    const { page } = await s.newPage(DESKTOP)
    await s.signIn(page, supervisor.email)
    await page.goto(`/board?date=${date}&area=${area.id}`)
    const techColumn = page.getByRole('region', { name: tech.name, exact: true })
    await techColumn.getByText(`${CARDS} tasks`).waitFor()
    await techColumn.locator(`li[data-task-id="${tasks[0].id}"]`).waitFor()
    // Only a window of the column is drawn; the rest appear as the column scrolls.
    const drawn = await techColumn.locator('li[data-task-id]').count()
    expect(drawn).toBeGreaterThan(3)
    expect(drawn).toBeLessThan(CARDS / 4)
    const last = tasks[CARDS - 1]
    expect(await techColumn.locator(`li[data-task-id="${last.id}"]`).count()).toBe(0)
    await techColumn.locator('li[data-task-id]').first().hover()
    for (let i = 0; i < 60 && (await techColumn.locator(`li[data-task-id="${last.id}"]`).count()) === 0; i++) await page.mouse.wheel(0, 4000)
    const card = techColumn.locator(`li[data-task-id="${last.id}"]`)
    await card.waitFor()
    await expect.poll(() => card.textContent()).toContain(`Feed ${CARDS}`)
    await screenshot(page, 'board-full-day-scrolled')

    const unassigned = page.getByRole('region', { name: 'Unassigned', exact: true })
    await mouseDrag(page, card, unassigned)
    await unassigned.locator(`li[data-task-id="${last.id}"]`).waitFor()
    await techColumn.getByText(`${CARDS - 1} tasks`).waitFor()
    // The column counts the card out as soon as it is dropped; the move commits when its request answers.
    await expect.poll(async () => (await (await page.request.get(`/api/tasks/${last.id}`)).json()).assigneeId).toBeNull()
  })
})
