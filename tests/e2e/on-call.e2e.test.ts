import { DateTime } from 'luxon'
import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { createOnCall } from '#server/modules/roster/roster.service'
import { DESKTOP, PHONE, screenshot, type BrowserSession, startBrowserOnFacility } from '#tests/support/browser'

let s: BrowserSession
let zone: string
beforeAll(async () => ({ s, zone } = await startBrowserOnFacility()))
afterAll(() => s?.close())

describe('the on-call page on a phone', () => {
  test('a technician sees who holds duty and how to call them, and leaves a handover note for the next holder', async () => {
    const holder = await s.createPerson('technician', { name: 'Ilse Marrow', onCallEligible: true, phone: '+61 7 5550 0142' })
    const today = DateTime.now().setZone(zone)
    await createOnCall({ personId: holder.id, fromDate: today.minus({ days: 1 }).toISODate()!, toDate: today.plus({ days: 1 }).toISODate()! })
    const tech = await s.createPerson('technician')

    const { page, context } = await s.newPage(PHONE)
    await s.signIn(page, tech.email)
    await page.goto('/on-call')
    const now = page.getByRole('region', { name: 'On call now' })
    await now.getByText('Ilse Marrow').waitFor()
    await now.getByText(/^Until \w{3} \d{1,2} \w{3}, \d\d:\d\d$/).waitFor()
    const call = now.getByRole('link', { name: 'Call +61 7 5550 0142' })
    expect(await call.getAttribute('href')).toBe('tel:+61755500142')
    expect(await now.getByRole('link', { name: /^E-mail Ilse/ }).getAttribute('href')).toBe(`mailto:${holder.email}`)
    await screenshot(page, 'on-call-phone')

    const text = `Tank T3 in the Trial Hall was slow to feed at 16:00; recheck DO first thing. (${Date.now()})`
    await page.getByLabel('Write a handover note').fill(text)
    await page.getByRole('button', { name: 'Save note' }).click()
    await page.getByRole('list', { name: 'Handover notes' }).getByText(text).waitFor()
    await expect.poll(() => page.getByLabel('Write a handover note').inputValue()).toBe('')
    await screenshot(page, 'on-call-phone-note')
    await context.close()

    const desk = await s.newPage(DESKTOP)
    await s.signIn(desk.page, tech.email)
    await desk.page.goto('/on-call')
    await desk.page.getByRole('list', { name: 'Handover notes' }).getByText(text).waitFor()
    await screenshot(desk.page, 'on-call-desktop')
    await desk.context.close()
  })
})
