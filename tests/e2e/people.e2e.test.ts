import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { DESKTOP, PHONE, screenshot, startBrowserSession, type BrowserSession } from '#tests/support/browser'

let s: BrowserSession
beforeAll(async () => {
  s = await startBrowserSession()
})
afterAll(() => s?.close())

describe('People page', () => {
  test('a manager adds a technician, who can then sign in on a phone', async () => {
    const manager = await s.createPerson('manager')
    const { page, context } = await s.newPage(DESKTOP)
    await s.signIn(page, manager.email)
    await page.goto('/people')
    await page.getByRole('button', { name: 'Add person' }).click()
    const email = `new-${Date.now()}@roundtide.example`
    await page.getByLabel('Name').fill('Rowan Shoal')
    await page.getByLabel('E-mail').fill(email)
    await page.getByLabel('First password').fill('short')
    await page.getByRole('button', { name: 'Add person' }).click()
    await page.getByText('Use at least 10 characters').waitFor()
    await page.getByLabel('First password').fill('rowan-first-pass')
    await page.getByRole('button', { name: 'Add person' }).click()
    await page.getByRole('cell', { name: email }).waitFor()
    await screenshot(page, 'people-desktop')
    await context.close()

    const phone = await s.newPage(PHONE)
    await s.signIn(phone.page, email, 'rowan-first-pass')
    await expect.poll(() => phone.page.url()).toContain('/round')
    await phone.context.close()
  })
})
