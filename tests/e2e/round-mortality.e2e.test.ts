import { DateTime } from 'luxon'
import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { db } from '#server/db/data-source'
import { MovementEntity } from '#server/modules/stock/stock.entities'
import { recordMovement } from '#server/modules/stock/stock.service'
import { DESKTOP, PHONE, screenshot, type BrowserSession, startBrowserOnFacility } from '#tests/support/browser'
import { makeAreaWithTanks } from '#tests/support/facility-fixtures'
import { makeBatch, parsedArrival } from '#tests/support/stock-fixtures'
import { makeTankTask } from '#tests/support/task-fixtures'

let s: BrowserSession
let zone: string
beforeAll(async () => ({ s, zone } = await startBrowserOnFacility()))
afterAll(() => s?.close())

describe('deaths counted on the round reach the stock register', () => {
  test('a technician records 3 dead fish with a cause on a phone, and the tank page then shows the count 3 lower and the mortality', async () => {
    const supervisor = await s.createPerson('supervisor')
    const tech = await s.createPerson('technician', { name: 'Ira Kowhai' })
    const { tanks } = await makeAreaWithTanks(1, { roundOrder: 1 })
    const tank = tanks[0]
    const batch = await makeBatch([], { meanWeightG: 50 })
    await recordMovement(supervisor, parsedArrival(batch.id, tank, 400))
    const due = DateTime.now().plus({ minutes: 10 }).setZone(zone)
    await makeTankTask(tank, {
      title: 'Morning tank check',
      assigneeId: tech.id,
      requiredReadings: ['mortalities', 'do_mgL', 'temp_c'],
      dueAt: due.toJSDate(),
      localDate: due.toISODate()!,
      localStart: due.toFormat("yyyy-MM-dd'T'HH:mm:ss"),
    })

    const { page, context } = await s.newPage(PHONE)
    await s.signIn(page, tech.email)
    await page.waitForURL('**/round')
    // The round opens the first task due by itself; the register's count sits beside the mortality field.
    const dead = page.getByLabel(/^Mortalities removed/)
    await dead.waitFor()
    await page.getByText('400 fish in this tank on the register').waitFor()
    await dead.fill('3')
    await page.getByLabel('Cause of death').selectOption('Water quality')
    await page.getByLabel('Kept for necropsy').check()
    await page.getByLabel('Dissolved oxygen').fill('6.4')
    await page.getByLabel('Temperature').fill('28.2')
    await page.screenshot({ path: 'test-results/round-mortality-phone-typing.png' })
    await page.getByRole('button', { name: 'Done', exact: true }).click()
    // 3 dead is above the tank's band (≤ 2): the completion is flagged, and the count beside the field drops.
    await page.getByText('Flag: Watch').first().waitFor()
    await screenshot(page, 'round-mortality-phone-done')
    // The recheck asks for the count again, and beside it the register already shows 3 fewer.
    await page.getByRole('button', { name: /Recheck: Morning tank check/ }).click()
    await page.getByText('397 fish in this tank on the register').waitFor()

    const rows = await db().getRepository(MovementEntity).findBy({ batchId: batch.id, kind: 'mortality' })
    expect(rows).toHaveLength(1)
    expect(rows[0]).toMatchObject({ count: 3, cause: 'Water quality', necropsy: true, fromTankId: tank.id, personId: tech.id })

    await page.goto(`/tanks/${tank.id}`)
    const register = page.getByRole('region', { name: 'Stock register' })
    await expect.poll(() => register.getByTestId('stock-count').textContent()).toBe('397')
    const entries = register.getByRole('list', { name: 'Stock register, newest first' }).getByRole('listitem')
    expect(await entries.count()).toBe(2)
    const newest = (await entries.first().textContent()) ?? ''
    expect(newest).toContain('Mortality')
    expect(newest).toContain('−3 fish')
    expect(newest).toContain('Cause: Water quality')
    expect(newest).toContain('kept for necropsy')
    expect(newest).toContain('Recorded by Ira Kowhai')
    expect(await entries.nth(1).textContent()).toContain('+400 fish')
    await screenshot(page, 'round-mortality-phone-tank-page')
    await context.close()

    const desk = await s.newPage(DESKTOP)
    await s.signIn(desk.page, supervisor.email)
    await desk.page.goto(`/batches/${batch.id}`)
    const batchRegister = desk.page.getByRole('region', { name: 'Stock register' })
    await expect.poll(() => batchRegister.getByTestId('stock-count').textContent()).toBe('397')
    // The batch page works its figures out from the same register: 397 fish × 50 g = 19.85 kg,
    // all of it in the one 1,000 L tank (1 m³), so 19.85 kg/m³; and it lists the same two rows.
    const figures = await batchRegister.locator('dl').textContent()
    expect(figures).toContain('Biomass19.85 kg')
    expect(figures).toContain('Stocking density19.85 kg/m³')
    const batchEntries = batchRegister.getByRole('list', { name: 'Stock register, newest first' }).getByRole('listitem')
    expect(await batchEntries.count()).toBe(2)
    expect(await batchEntries.first().textContent()).toContain('Cause: Water quality')
    expect(await batchEntries.nth(1).textContent()).toContain('+400 fish')
    await screenshot(desk.page, 'round-mortality-desktop-batch-page')
    await desk.context.close()
  }, 120_000)
})
