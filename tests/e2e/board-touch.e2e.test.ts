import { DateTime } from 'luxon'
import type { CDPSession, Locator } from 'playwright-core'
import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { createShift } from '#server/modules/roster/roster.service'
import { screenshot, type BrowserSession, startBrowserOnFacility } from '#tests/support/browser'
import { makeAreaWithTanks } from '#tests/support/facility-fixtures'
import { makeTankTask } from '#tests/support/task-fixtures'

const TABLET = { width: 820, height: 1180 }

let s: BrowserSession
let zone: string
beforeAll(async () => ({ s, zone } = await startBrowserOnFacility()))
afterAll(() => s?.close())

/** A real touch drag through Chromium's input pipeline: press, hold past the sensor's delay, move, lift. */
async function touchDrag(cdp: CDPSession, from: Locator, to: Locator) {
  const a = (await from.boundingBox())!
  const b = (await to.boundingBox())!
  const start = { x: a.x + a.width / 2, y: a.y + a.height / 2 }
  const end = { x: b.x + b.width / 2, y: b.y + Math.min(b.height / 2, 80) }
  await cdp.send('Input.dispatchTouchEvent', { type: 'touchStart', touchPoints: [start] })
  await new Promise((r) => setTimeout(r, 400))
  for (let i = 1; i <= 12; i++) {
    const p = { x: start.x + ((end.x - start.x) * i) / 12, y: start.y + ((end.y - start.y) * i) / 12 }
    await cdp.send('Input.dispatchTouchEvent', { type: 'touchMove', touchPoints: [p] })
    await new Promise((r) => setTimeout(r, 30))
  }
  await cdp.send('Input.dispatchTouchEvent', { type: 'touchEnd', touchPoints: [] })
}

describe('the board on a tablet', () => {
  test('a supervisor assigns a card by touch, holding its handle; it stays after reload', async () => {
    const { area, tanks } = await makeAreaWithTanks(1)
    const monday = DateTime.now().setZone(zone).plus({ days: 330 }).startOf('week')
    const date = monday.toISODate()!
    const due = monday.set({ hour: 9, minute: 0 })
    const task = await makeTankTask(tanks[0], {
      title: 'Touch-drag check',
      dueAt: due.toJSDate(),
      localDate: date,
      localStart: `${date}T09:00:00`,
      occurrenceStart: `${date}T09:00:00`,
      status: 'planned',
    })
    const tech = await s.createPerson('technician', { name: 'Lena Reef' })
    await createShift({ personId: tech.id, date, start: '07:00', end: '15:30', kind: 'day' })
    const supervisor = await s.createPerson('supervisor')

    const context = await s.newContext({ viewport: TABLET, hasTouch: true })
    const page = await context.newPage()
    await s.signIn(page, supervisor.email)
    await page.goto(`/board?date=${date}&area=${area.id}`)
    const card = page.locator(`li[data-task-id="${task.id}"]`)
    await card.waitFor()
    const techColumn = page.getByRole('region', { name: tech.name, exact: true })
    const cdp = await context.newCDPSession(page)
    await touchDrag(cdp, card.getByRole('button', { name: /^Move / }), techColumn)
    await techColumn.locator(`li[data-task-id="${task.id}"]`).waitFor()
    await screenshot(page, 'board-tablet-touch')
    await page.reload()
    await techColumn.locator(`li[data-task-id="${task.id}"]`).waitFor()
    const res = await page.request.get(`/api/tasks/${task.id}`)
    expect((await res.json()).assigneeId).toBe(tech.id)
    await context.close()
  })
})
