import { DateTime } from 'luxon'
import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { db } from '#server/db/data-source'
import { advanceTaskStatuses } from '#server/jobs/status-clock'
import type { Tank } from '#shared/schemas/facility'
import { DESKTOP, PHONE, screenshot, type BrowserSession, startBrowserOnFacility } from '#tests/support/browser'
import { makeAreaWithTanks } from '#tests/support/facility-fixtures'
import { makeTankTask } from '#tests/support/task-fixtures'

const MIN = 60_000
const HOUR = 60 * MIN

let s: BrowserSession
let zone: string
beforeAll(async () => ({ s, zone } = await startBrowserOnFacility()))
afterAll(() => s?.close())

/** A welfare-critical check whose grace ends at `missedAt`; the status clock then runs at `clockAt` and proposes an incident. */
async function missCheck(tank: Tank, title: string, missedAt: Date, assigneeId: number) {
  const due = DateTime.fromJSDate(new Date(missedAt.getTime() - HOUR)).setZone(zone)
  await makeTankTask(tank, {
    title,
    assigneeId,
    status: 'overdue',
    dueAt: due.toJSDate(),
    windowStartAt: new Date(due.toMillis() - 30 * MIN),
    graceUntil: missedAt,
    localDate: due.toISODate()!,
    localStart: due.toFormat("yyyy-MM-dd'T'HH:mm:ss"),
    occurrenceStart: due.toFormat("yyyy-MM-dd'T'HH:mm:ss"),
  })
  await advanceTaskStatuses(db(), new Date(missedAt.getTime() + 1000))
}

describe('incidents proposed by Roundtide', () => {
  test('the supervisor confirms a proposed incident with a reason, and the welfare officer sees it counting down on a phone and adds a note', async () => {
    const supervisor = await s.createPerson('supervisor', { name: 'Tui Marsden' })
    const officer = await s.createPerson('observer', { name: 'Ana Reyes', title: 'Welfare officer' })
    const tech = await s.createPerson('technician')
    const { tanks } = await makeAreaWithTanks(2)
    // One missed 29 hours ago (its 24 h welfare deadline has passed), one missed just now.
    await missCheck(tanks[1], 'Night oxygen check', new Date(Date.now() - 29 * HOUR), tech.id)
    await missCheck(tanks[0], 'Morning tank check', new Date(Date.now() - MIN), tech.id)

    const desk = await s.newPage(DESKTOP)
    await s.signIn(desk.page, supervisor.email)
    await desk.page.getByRole('link', { name: 'Incidents' }).click()
    await desk.page.getByRole('heading', { name: 'Incidents', level: 1 }).waitFor()
    const list = desk.page.getByRole('list', { name: 'Incidents' }).getByRole('listitem')
    await expect.poll(() => list.count()).toBe(2)
    const late = list.filter({ hasText: 'Night oxygen check' })
    expect(await late.textContent()).toMatch(/Proposed: needs a decision.*Tell the welfare officer: Overdue by 5 h \d+ min/)
    const fresh = list.filter({ hasText: 'Morning tank check' })
    expect(await fresh.textContent()).toMatch(/Tell the welfare officer: 23 h \d+ min left/)
    await screenshot(desk.page, 'incidents-desktop-list')

    await fresh.getByRole('link').click()
    await desk.page.getByRole('heading', { name: /^Incident #\d+: Missed welfare-critical check: Morning tank check$/ }).waitFor()
    const decide = desk.page.getByRole('form', { name: 'Decide on this proposal' })
    await decide.getByRole('button', { name: 'Confirm incident' }).click()
    await decide.getByText('Say why in a few words').waitFor()
    await decide.getByLabel('Reason').fill('Fish in the tank were gasping at the surface by 09:00')
    await decide.getByRole('button', { name: 'Confirm incident' }).click()
    await desk.page.getByRole('main').getByText('Open', { exact: true }).waitFor()
    await decide.waitFor({ state: 'detached' })
    const timeline = desk.page.getByRole('list', { name: 'Timeline' })
    await timeline.getByText('Confirmed by Tui Marsden').waitFor()
    await timeline.getByText('Fish in the tank were gasping at the surface by 09:00').waitFor()
    await screenshot(desk.page, 'incidents-desktop-confirmed')

    // The record: who was told (the welfare officer, in time) and the root cause; it stays open until reported.
    await desk.page.getByRole('button', { name: 'Fill in the record' }).click()
    const record = desk.page.getByRole('form', { name: 'Incident record' })
    await record.getByRole('button', { name: 'Add who was told' }).click()
    await record.getByLabel('Person or body 1').fill('Ana Reyes, welfare officer (phone)')
    await record.getByLabel('Told at').fill(DateTime.now().setZone(zone).toFormat("yyyy-MM-dd'T'HH:mm"))
    await record.getByLabel('Root cause').fill('Aerator breaker tripped overnight')
    await record.getByLabel('Animals affected').fill('40')
    await screenshot(desk.page, 'incidents-desktop-editing')
    await record.getByRole('button', { name: 'Save the record' }).click()
    await record.waitFor({ state: 'detached' })
    const deskDeadlines = desk.page.getByRole('region', { name: 'Deadlines' })
    await deskDeadlines.getByText(/^Met on /).waitFor()
    await desk.page.getByText('Aerator breaker tripped overnight').waitFor()
    const incidentUrl = new URL(desk.page.url()).pathname
    await desk.context.close()

    const phone = await s.newPage(PHONE)
    await s.signIn(phone.page, officer.email)
    await phone.page.goto('/incidents')
    const seen = phone.page.getByRole('list', { name: 'Incidents' }).getByRole('listitem').filter({ hasText: 'Morning tank check' })
    await seen.getByText('Open', { exact: true }).waitFor()
    // The welfare officer was told in time, so the list counts down to the committee's deadline.
    expect(await seen.textContent()).toMatch(/Report to the ethics committee: 2 d 23 h left/)
    await screenshot(phone.page, 'incidents-phone-list')

    await seen.getByRole('link').click()
    await phone.page.waitForURL(`**${incidentUrl}`)
    const deadlines = phone.page.getByRole('region', { name: 'Deadlines' })
    expect(await deadlines.textContent()).toMatch(
      /Tell the welfare officer: Met on .*Report to the ethics committee: 2 d 23 h left.*Full report: 6 d 23 h left/,
    )
    // An observer reads and adds notes; confirming is not theirs.
    expect(await phone.page.getByRole('form', { name: 'Decide on this proposal' }).count()).toBe(0)
    expect(await phone.page.getByRole('button', { name: 'Fill in the record' }).count()).toBe(0)
    await phone.page
      .getByRole('textbox', { name: 'Note', exact: true })
      .fill('Spoke to the technician; aerator breaker tripped overnight. Keep the tank on hourly checks today.')
    await phone.page.getByRole('button', { name: 'Add note' }).click()
    await phone.page.getByRole('list', { name: 'Timeline' }).getByText('Note by Ana Reyes').waitFor()
    await phone.page
      .getByRole('list', { name: 'Timeline' })
      .getByText(/Keep the tank on hourly checks today/)
      .waitFor()
    await screenshot(phone.page, 'incidents-phone-record')
    await phone.context.close()
  }, 120_000)
})
