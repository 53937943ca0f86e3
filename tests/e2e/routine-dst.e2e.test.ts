import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { db } from '#server/db/data-source'
import { createFacilityIfMissing } from '#server/modules/facility/facility.service'
import { materialise } from '#server/modules/scheduling/materialiser'
import { TaskEntity } from '#server/modules/tasks/task.entity'
import { DESKTOP, screenshot, startBrowserSession, type BrowserSession } from '#tests/support/browser'
import { ensureFacilityAndParameters, makeAreaWithTanks } from '#tests/support/facility-fixtures'

// This journey runs in a facility in Berlin: clocks go forward on Sunday 28 March 2027 (EU rule).
let s: BrowserSession
beforeAll(async () => {
  s = await startBrowserSession()
  await createFacilityIfMissing({
    name: 'Spree Hatchery (invented)',
    timeZone: 'Europe/Berlin',
    handoverTime: '08:00',
    quarantineDays: 30,
    arrivalTempDiffLimitC: 2,
    minOxygenHours: 12,
  })
  await ensureFacilityAndParameters()
})
afterAll(() => s?.close())

describe('a routine across a daylight-saving change', () => {
  test('made in the editor, a daily 07:30 feed previews the clock change and becomes tasks at 07:30 local on both sides of it', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const manager = await s.createPerson('manager')
    const { page, context } = await s.newPage(DESKTOP)
    await s.signIn(page, manager.email)
    await page.goto('/routines/new')
    await page.getByLabel('Name').fill('Morning feed, spring change')
    await page.getByLabel('Category').selectOption({ label: 'Feeding' })
    await page.getByLabel('Target kind').selectOption({ label: 'Tanks' })
    await page.getByRole('checkbox', { name: new RegExp(tanks[0].code) }).check()
    await page.getByLabel('Repeats').selectOption({ label: 'Every day at set times' })
    await page.getByLabel('Starts on').fill('2027-03-25')
    await page.getByLabel('Time of day 1').fill('07:30')
    const rows = page.getByRole('table', { name: 'Next 10 dates' }).getByRole('row')
    await expect.poll(() => rows.count()).toBe(11)
    const cells = await rows.evaluateAll((trs) => trs.slice(1).map((tr) => [...tr.querySelectorAll('td')].map((td) => td.textContent?.trim() ?? '')))
    expect(cells.every((c) => c[2] === '07:30')).toBe(true)
    expect(cells[0][3]).toMatch(/\+01:00|UTC\+1/)
    expect(cells.find((c) => /clocks changed/.test(c[3]))?.[3]).toMatch(/\+02:00|UTC\+2/)
    await screenshot(page, 'routine-dst-preview')
    await page.getByRole('button', { name: 'Save routine' }).click()
    await page.waitForURL(/\/routines\/\d+$/)
    const routineId = Number(new URL(page.url()).pathname.split('/').pop())
    await context.close()

    // The horizon today does not reach March 2027, so materialise that week explicitly.
    await materialise({ routineIds: [routineId], from: new Date('2027-03-26T00:00:00Z'), horizonDays: 4 })
    const tasks = await db()
      .getRepository(TaskEntity)
      .find({ where: { routineId }, order: { dueAt: 'ASC' } })
    expect(tasks.map((t) => t.localStart)).toEqual(['2027-03-26T07:30:00', '2027-03-27T07:30:00', '2027-03-28T07:30:00', '2027-03-29T07:30:00'])
    // Computed by hand: CET is UTC+1 until 28 March 02:00, then CEST is UTC+2.
    expect(tasks.map((t) => t.dueAt.toISOString())).toEqual([
      '2027-03-26T06:30:00.000Z',
      '2027-03-27T06:30:00.000Z',
      '2027-03-28T05:30:00.000Z',
      '2027-03-29T05:30:00.000Z',
    ])
  })
})
