import { randomUUID } from 'node:crypto'
import { DateTime } from 'luxon'
import type { Page } from 'playwright-core'
import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { createOnCall, createShift } from '#server/modules/roster/roster.service'
import type { Tank } from '#shared/schemas/facility'
import { DESKTOP, PHONE, screenshot, type BrowserSession, startBrowserOnFacility } from '#tests/support/browser'
import { makeAreaWithTanks } from '#tests/support/facility-fixtures'
import { makeTankTask } from '#tests/support/task-fixtures'

const TABLET = { width: 820, height: 1180 }

let s: BrowserSession
let zone: string
beforeAll(async () => ({ s, zone } = await startBrowserOnFacility()))
afterAll(() => s?.close())

function taskAt(tank: Tank, date: string, time: string, extra: Parameters<typeof makeTankTask>[1] = {}) {
  const due = DateTime.fromISO(`${date}T${time}`, { zone })
  return makeTankTask(tank, { dueAt: due.toJSDate(), localDate: date, localStart: `${date}T${time}:00`, occurrenceStart: `${date}T${time}:00`, ...extra })
}

/** A month far ahead that no other journey touches: one busy day with a shift and on-call duty. */
async function arrange() {
  const tag = randomUUID().slice(0, 5)
  const monthStart = DateTime.now().setZone(zone).plus({ days: 420 }).startOf('month')
  const day = monthStart.plus({ days: 9 }).toISODate()!
  const { tanks } = await makeAreaWithTanks(2)
  const tech = await s.createPerson('technician', { name: `Lena Ortiz ${tag}` })
  const onCall = await s.createPerson('supervisor', { name: `Kofi Mensah ${tag}`, onCallEligible: true })
  await createShift({ personId: tech.id, date: day, start: '07:00', end: '15:00', kind: 'day' })
  await createOnCall({ personId: onCall.id, fromDate: day, toDate: DateTime.fromISO(day).plus({ days: 1 }).toISODate()! })
  await Promise.all([
    taskAt(tanks[0], day, '07:30', { status: 'done', category: 'feeding', title: 'Morning feed' }),
    taskAt(tanks[1], day, '07:35', { status: 'done', category: 'feeding', title: 'Morning feed' }),
    taskAt(tanks[0], day, '08:00', { status: 'missed', category: 'welfare' }),
    taskAt(tanks[1], day, '09:00', { status: 'planned', category: 'feeding', title: 'Midday feed' }),
    taskAt(tanks[0], day, '10:00', { status: 'open', category: 'water_quality', title: 'Water test' }),
  ])
  return { monthStart: monthStart.toISODate()!, day, tech, onCall }
}

const cell = (page: Page, date: string) => page.locator(`td.fc-daygrid-day[data-date="${date}"]`)

describe('the calendar', () => {
  test('the month shows counts, categories, shift and on-call names for a day; clicking the day opens its board', async () => {
    const { monthStart, day, tech, onCall } = await arrange()
    const supervisor = await s.createPerson('supervisor')
    const { page, context } = await s.newPage(DESKTOP)
    const warnings: string[] = []
    page.on('console', (m) => (m.type() === 'error' || m.type() === 'warning') && warnings.push(m.text()))
    const ranges: string[] = []
    page.on('request', (r) => r.url().includes('/api/calendar?') && ranges.push(new URL(r.url()).search))
    await s.signIn(page, supervisor.email)

    await page.goto(`/calendar?date=${monthStart}`)
    const busy = cell(page, day)
    await busy.getByText('5 tasks').waitFor()
    await busy.getByText('done').waitFor()
    expect((await busy.innerText()).replace(/\s+/g, ' ')).toMatch(/2 done 2 open 1 missed/)
    await busy.getByText('Feeding 3').waitFor()
    await busy.getByText(tech.name).waitFor()
    await busy.getByText(onCall.name).waitFor()
    // Duty runs past the handover into the next morning.
    await cell(page, DateTime.fromISO(day).plus({ days: 1 }).toISODate()!)
      .getByText(onCall.name)
      .waitFor()
    await screenshot(page, 'calendar-month-desktop')

    // Only the visible range was asked for: whole weeks from Monday around this month.
    const first = new URLSearchParams(ranges[0])
    const from = DateTime.fromISO(first.get('from')!)
    const to = DateTime.fromISO(first.get('to')!)
    expect(from.weekday).toBe(1)
    expect(to.weekday).toBe(7)
    expect(from <= DateTime.fromISO(monthStart) && to >= DateTime.fromISO(monthStart).endOf('month').startOf('day')).toBe(true)

    // Next month asks for its own range; back again uses the cache.
    await page.getByRole('button', { name: 'Next month' }).click()
    await expect.poll(() => ranges.length).toBe(2)
    await page.getByRole('button', { name: 'Previous month' }).click()
    await busy.getByText(tech.name).waitFor()

    // The week view keeps the calendar's date; the address carries date and view for a reload.
    await page.getByRole('button', { name: 'Week' }).click()
    await expect.poll(() => new URL(page.url()).searchParams.get('view')).toBe('week')
    await page.getByRole('button', { name: 'Next week' }).waitFor()
    await page.goto(`/calendar?date=${day}&view=week`)
    await cell(page, day).getByText(onCall.name).waitFor()
    await cell(page, day).getByText('Water quality 1').waitFor()
    await screenshot(page, 'calendar-week-desktop')
    await page.getByRole('button', { name: 'Month' }).click()

    await page.setViewportSize(TABLET)
    await page.reload()
    await busy.getByText(onCall.name).waitFor()
    await screenshot(page, 'calendar-month-tablet')
    await page.setViewportSize(DESKTOP)

    await busy.click()
    await page.waitForURL(`**/board?date=${day}`)
    await page.getByRole('heading', { name: 'Board' }).waitFor()
    await page.getByRole('region', { name: tech.name, exact: true }).waitFor()
    expect(warnings.filter((w) => /flushSync/.test(w))).toEqual([])
    await context.close()

    const phone = await s.newPage(PHONE)
    await s.signIn(phone.page, tech.email)
    await phone.page.goto(`/calendar?date=${monthStart}`)
    await cell(phone.page, day).getByText('missed').waitFor()
    await screenshot(phone.page, 'calendar-month-phone')
    // The keyboard reaches a day too: its number is a link-like control that opens the board.
    await cell(phone.page, day).locator('a[data-navlink]').focus()
    await phone.page.keyboard.press('Enter')
    await phone.page.waitForURL(`**/board?date=${day}`)
    await phone.context.close()
  })
})
