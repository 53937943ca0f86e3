import { afterAll, beforeAll, describe, test } from 'vitest'
import { DESKTOP, PHONE, screenshot, type BrowserSession, startBrowserOnFacility } from '#tests/support/browser'

let s: BrowserSession
let zone: string
beforeAll(async () => ({ s, zone } = await startBrowserOnFacility()))
afterAll(() => s?.close())

// Any real zone other than the demo's will do; this one is far from it, so nothing matches by accident.
const NEW_ZONE = 'Pacific/Chatham'

describe('Facility clock', () => {
  test('a manager changes the time zone and a page opened before shows the new zone without a reload', async () => {
    const manager = await s.createPerson('manager')
    const { page, context } = await s.newPage(DESKTOP)
    await s.signIn(page, manager.email)
    const main = page.getByRole('navigation', { name: 'Main' }).first()

    // The reports page reads the facility first, so the old zone is in the browser's cache.
    await page.goto('/reports')
    await page.getByText(`facility days in ${zone}`).waitFor()

    await main.getByRole('link', { name: 'Tanks' }).click()
    await page.getByRole('navigation', { name: 'Tanks sections' }).getByRole('link', { name: 'Settings' }).click()
    const form = page.getByRole('form', { name: 'Facility settings' })
    await form.getByLabel('Time zone').fill(NEW_ZONE)
    await form.getByRole('button', { name: 'Save settings' }).click()
    await page.getByText('Facility settings saved.').waitFor()
    await page.getByText(`· ${NEW_ZONE}`).waitFor()
    await screenshot(page, 'facility-clock-saved-desktop')

    // Back by the menu, no reload: the page must not keep the old zone for the minutes its cache is fresh.
    await main.getByRole('link', { name: 'Reports' }).click()
    await page.getByText(`facility days in ${NEW_ZONE}`).waitFor()
    await context.close()

    const phone = await s.newPage(PHONE)
    await s.signIn(phone.page, manager.email)
    await phone.page.goto('/tanks?tab=settings')
    await phone.page.getByRole('form', { name: 'Facility settings' }).getByLabel('Time zone').waitFor()
    await screenshot(phone.page, 'facility-clock-settings-phone')
    await phone.context.close()
  })
})
