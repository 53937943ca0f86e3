import { mkdtemp, rm, writeFile } from 'node:fs/promises'
import os from 'node:os'
import path from 'node:path'
import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { tanks } from '#server/modules/facility/catalogues'
import { createFacilityIfMissing } from '#server/modules/facility/facility.service'
import { DESKTOP, PHONE, screenshot, startBrowserSession, type BrowserSession } from '#tests/support/browser'

const HEADER = 'code,name,area,system,volume_l,kind,in_use'

let s: BrowserSession
let dir: string
beforeAll(async () => {
  s = await startBrowserSession()
  await createFacilityIfMissing({
    name: 'Test hatchery',
    timeZone: 'Europe/Oslo',
    handoverTime: '08:00',
    quarantineDays: 30,
    arrivalTempDiffLimitC: 2,
    minOxygenHours: 12,
  })
  dir = await mkdtemp(path.join(os.tmpdir(), 'roundtide-tanks-'))
})
afterAll(async () => {
  await s?.close()
  if (dir) await rm(dir, { recursive: true, force: true })
})

async function csv(name: string, lines: string[]) {
  const file = path.join(dir, name)
  await writeFile(file, [HEADER, ...lines].join('\n') + '\n')
  return file
}

describe('Tanks page', () => {
  test('a manager adds an area and a tank through the forms, then imports tanks from CSV', async () => {
    const stamp = Date.now().toString(36)
    const nursery = { code: `NUR-${stamp}`, name: `Nursery ${stamp}` }
    const quarantine = { code: `QUA-${stamp}`, name: `Quarantine ${stamp}` }
    const [tank1, tank2, tank3] = [1, 2, 3].map((n) => `T${n}-${stamp}`)
    const manager = await s.createPerson('manager')
    const { page, context } = await s.newPage(DESKTOP)
    await s.signIn(page, manager.email)
    await page.goto('/tanks')
    await page.getByRole('heading', { name: 'Tanks', level: 1 }).waitFor()

    for (const area of [nursery, { ...quarantine, quarantine: true }]) {
      await page.getByRole('button', { name: 'Add area' }).click()
      const form = page.getByRole('form', { name: 'New area' })
      await form.getByLabel('Code').fill(area.code)
      await form.getByLabel('Name').fill(area.name)
      if ('quarantine' in area) await form.getByLabel('Quarantine area').check()
      await form.getByRole('button', { name: 'Add area' }).click()
      await page.getByRole('heading', { name: `${area.name} (${area.code})` }).waitFor()
    }
    await page.getByRole('button', { name: 'Add area' }).click()
    const again = page.getByRole('form', { name: 'New area' })
    await again.getByLabel('Code').fill(nursery.code)
    await again.getByLabel('Name').fill('Second nursery')
    await again.getByRole('button', { name: 'Add area' }).click()
    await again.getByText(`Another area already has the code ${nursery.code}.`).waitFor()
    await again.getByRole('button', { name: 'Cancel' }).click()

    const quarantineBranch = page.getByRole('listitem').filter({ has: page.getByRole('heading', { name: quarantine.name }) })
    await quarantineBranch.getByText('Quarantine', { exact: true }).waitFor()

    await page.getByRole('navigation', { name: 'Tanks sections' }).getByRole('link', { name: 'Tanks' }).click()
    await page.getByRole('button', { name: 'Add tank' }).click()
    const tankForm = page.getByRole('form', { name: 'New tank' })
    await tankForm.getByLabel('Code').fill(tank1)
    await tankForm.getByLabel('Name').fill('Nursery tank 1')
    await tankForm.getByLabel('Area').selectOption({ label: `${nursery.name} (${nursery.code})` })
    await tankForm.getByLabel('Volume (litres)').fill('-5')
    await tankForm.getByRole('button', { name: 'Add tank' }).click()
    await tankForm.getByText('Enter a number above 0').waitFor()
    expect(await tankForm.getByLabel('Volume (litres)').getAttribute('aria-invalid')).toBe('true')
    await tankForm.getByLabel('Volume (litres)').fill('800')
    await tankForm.getByRole('button', { name: 'Add tank' }).click()
    await page.getByRole('cell', { name: tank1, exact: true }).waitFor()

    const fileInput = page.getByLabel('CSV file', { exact: true })
    await fileInput.setInputFiles(
      await csv('bad.csv', [`${tank2},Grow tank 2,${nursery.code},,1200,tank,yes`, `${tank3},Quarantine bin 3,NOPE-${stamp},,120,bin,no`]),
    )
    await page.getByRole('button', { name: 'Import tanks' }).click()
    await page.getByText(`Line 3: area "NOPE-${stamp}" does not exist`).waitFor()
    await page.getByText('Nothing was imported').waitFor()
    expect(await page.getByRole('cell', { name: tank2, exact: true }).count()).toBe(0)
    expect((await tanks.list()).map((t) => t.code)).not.toContain(tank2)
    await screenshot(page, 'tanks-import-error-desktop')

    await fileInput.setInputFiles(
      await csv('good.csv', [
        `${tank1},Nursery tank 1,${nursery.code},,800,tank,yes`,
        `${tank2},Grow tank 2,${nursery.code},,1200,tank,yes`,
        `${tank3},Quarantine bin 3,${quarantine.code},,120,bin,no`,
      ]),
    )
    await page.getByRole('button', { name: 'Import tanks' }).click()
    await page.getByText('2 created, 0 updated, 1 unchanged').waitFor()
    await page.getByRole('cell', { name: tank3, exact: true }).waitFor()

    await page.getByLabel('Find tanks').fill(stamp)
    await page.getByLabel('State').selectOption({ label: 'Empty only' })
    await expect.poll(() => page.getByRole('row').count()).toBe(2)
    await page
      .getByRole('row', { name: new RegExp(tank3) })
      .getByText('Empty')
      .waitFor()
    await page.getByLabel('State').selectOption({ label: 'In use and empty' })
    await screenshot(page, 'tanks-table-desktop')

    await page.getByRole('button', { name: `Delete tank ${tank2}` }).click()
    await page
      .getByRole('group', { name: `Delete tank ${tank2}` })
      .getByRole('button', { name: 'Delete' })
      .click()
    await expect.poll(() => page.getByRole('cell', { name: tank2, exact: true }).count()).toBe(0)

    await page.getByRole('navigation', { name: 'Tanks sections' }).getByRole('link', { name: 'Overview' }).click()
    await quarantineBranch.getByText(tank3).waitFor()
    await screenshot(page, 'tanks-overview-desktop')
    await context.close()

    const phone = await s.newPage(PHONE)
    await s.signIn(phone.page, manager.email)
    await phone.page.goto('/tanks')
    await phone.page.getByRole('heading', { name: `${nursery.name} (${nursery.code})` }).waitFor()
    await screenshot(phone.page, 'tanks-overview-phone')
    await phone.page.goto('/tanks?tab=tanks')
    await phone.page.getByLabel('Find tanks').fill(stamp)
    await phone.page.getByRole('cell', { name: tank1, exact: true }).waitFor()
    await phone.page.getByRole('button', { name: 'Add tank' }).click()
    await screenshot(phone.page, 'tanks-table-phone')
    await phone.page.setViewportSize({ width: 360, height: 780 })
    await phone.page.getByRole('button', { name: 'Cancel' }).click()
    await screenshot(phone.page, 'tanks-table-phone-360')
    await phone.context.close()
  })
})
