import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { getStockSettings } from '#server/modules/stock/stock-settings.service'
import { DESKTOP, PHONE, screenshot, startBrowserSession, type BrowserSession } from '#tests/support/browser'
import { ensureFacilityAndParameters } from '#tests/support/facility-fixtures'

let s: BrowserSession
beforeAll(async () => {
  s = await startBrowserSession()
  await ensureFacilityAndParameters()
})
afterAll(() => s?.close())

describe('the animal record settings', () => {
  test('a manager edits the causes of death and the loss threshold, and the facility keeps them; a technician sees no such form', async () => {
    const manager = await s.createPerson('manager')
    const { page, context } = await s.newPage(DESKTOP)
    await s.signIn(page, manager.email)
    await page.goto('/settings')
    const form = page.getByRole('form', { name: 'Animal record settings' })
    await form.getByLabel('Causes of death (one per line)').fill('Gill damage\n  Handling  \nGill damage\n\nJumped out')
    await form.getByLabel('7-day losses that raise a flag (% of the batch)').fill('1.5')
    await form.getByRole('button', { name: 'Save animal record settings' }).click()
    await page.getByText('Animal record settings saved.').waitFor()
    await screenshot(page, 'animal-record-settings-desktop')
    // Blank lines and repeats are dropped; what the round offers comes from here.
    expect(await getStockSettings()).toMatchObject({ mortalityCauses: ['Gill damage', 'Handling', 'Jumped out'], mortalityWeekPct: 1.5 })
    await page.reload()
    expect(await page.getByLabel('Causes of death (one per line)').inputValue()).toBe('Gill damage\nHandling\nJumped out')
    await context.close()

    const tech = await s.createPerson('technician')
    const phone = await s.newPage(PHONE)
    await s.signIn(phone.page, tech.email)
    await phone.page.goto('/settings')
    await phone.page.getByRole('heading', { name: 'How escalations reach me' }).waitFor()
    expect(await phone.page.getByRole('form', { name: 'Animal record settings' }).count()).toBe(0)
    await phone.context.close()
  })
})
