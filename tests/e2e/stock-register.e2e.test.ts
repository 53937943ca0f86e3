import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { recordMovement } from '#server/modules/stock/stock.service'
import { DESKTOP, PHONE, screenshot, startBrowserSession, type BrowserSession } from '#tests/support/browser'
import { ensureFacilityAndParameters, makeAreaWithTanks } from '#tests/support/facility-fixtures'
import { makeBatch, parsedArrival } from '#tests/support/stock-fixtures'

let s: BrowserSession
beforeAll(async () => {
  s = await startBrowserSession()
  await ensureFacilityAndParameters()
})
afterAll(() => s?.close())

describe('the stock register on the tank page', () => {
  test('a supervisor splits a batch into a second tank, is refused a mortality larger than the tank holds without losing what was typed, then corrects a count', async () => {
    const supervisor = await s.createPerson('supervisor', { name: 'Noa Ferris' })
    const { tanks } = await makeAreaWithTanks(2)
    const [first, second] = tanks
    const batch = await makeBatch([], { meanWeightG: 120 })
    await recordMovement(supervisor, parsedArrival(batch.id, first, 500))

    const { page, context } = await s.newPage(DESKTOP)
    await s.signIn(page, supervisor.email)
    await page.goto(`/tanks/${first.id}`)
    const register = page.getByRole('region', { name: 'Stock register' })
    await expect.poll(() => register.getByTestId('stock-count').textContent()).toBe('500')
    // 500 fish × 120 g = 60 kg in a 1,000 L tank: 60 kg/m³.
    await register.getByText('60 kg/m³').first().waitFor()

    await register.getByRole('button', { name: 'Record a movement' }).click()
    const form = page.getByRole('form', { name: 'Record a movement' })
    await form.getByLabel('What happened').selectOption('transfer')
    await form.getByLabel('To tank').selectOption(String(second.id))
    await form.getByLabel('Number of fish').fill('200')
    await form.getByRole('button', { name: 'Record movement' }).click()
    await expect.poll(() => register.getByTestId('stock-count').textContent()).toBe('300')
    const entries = register.getByRole('list', { name: 'Stock register, newest first' }).getByRole('listitem')
    // The count and the register list are separate answers: wait for the list to show the transfer too.
    await expect.poll(() => entries.first().textContent()).toContain(`${first.code} → ${second.code}`)
    expect(await entries.first().textContent()).toContain('−200 fish')

    // More dead than the tank holds: the server's words show, and every field keeps what was typed.
    await form.getByLabel('What happened').selectOption('mortality')
    await form.getByLabel('Number of fish').fill('350')
    await form.getByLabel('Cause of death').selectOption('other')
    await form.getByLabel('What was the cause?').fill('Caught in the outlet screen')
    await form.getByLabel('Note (optional)').fill('Found during the evening check')
    await form.getByRole('button', { name: 'Record movement' }).click()
    await form
      .getByRole('alert')
      .getByText(/Nothing was saved: the register shows 300 fish of this batch in/)
      .waitFor()
    await form.getByText('Only 300 on the register here').waitFor()
    expect(await form.getByLabel('Number of fish').inputValue()).toBe('350')
    expect(await form.getByLabel('What was the cause?').inputValue()).toBe('Caught in the outlet screen')
    expect(await form.getByLabel('Note (optional)').inputValue()).toBe('Found during the evening check')
    expect(await entries.count()).toBe(2)
    await screenshot(page, 'stock-register-desktop-refused')

    // The count on paper was right after all: fix the number and save again.
    await form.getByLabel('Number of fish').fill('5')
    await form.getByRole('button', { name: 'Record movement' }).click()
    await expect.poll(() => register.getByTestId('stock-count').textContent()).toBe('295')
    await expect.poll(() => entries.count()).toBe(3)

    // A correction points at the entry it corrects, and that entry says it was corrected.
    const mortalityId = (await entries.first().getAttribute('id'))!.replace('movement-', '')
    await form.getByLabel('What happened').selectOption('correction')
    await form.getByLabel('Change in count (+ adds, − takes off)').fill('2')
    await form.getByLabel('Corrects entry (optional)').selectOption(mortalityId)
    await form.getByLabel('Reason').fill('Two of the five recovered and swam off')
    await form.getByRole('button', { name: 'Record movement' }).click()
    await expect.poll(() => register.getByTestId('stock-count').textContent()).toBe('297')
    await expect.poll(() => entries.first().textContent()).toContain(`Corrects #${mortalityId}`)
    await expect.poll(() => register.locator(`#movement-${mortalityId}`).textContent()).toContain('Corrected by')
    await screenshot(page, 'stock-register-desktop')
    await context.close()

    const phone = await s.newPage(PHONE)
    await s.signIn(phone.page, supervisor.email)
    await phone.page.goto(`/tanks/${second.id}`)
    const there = phone.page.getByRole('region', { name: 'Stock register' })
    await expect.poll(() => there.getByTestId('stock-count').textContent()).toBe('200')
    await there.getByRole('button', { name: 'Record a movement' }).click()
    await there.screenshot({ path: 'test-results/stock-register-phone.png' })
    await phone.context.close()
  }, 120_000)
})
