import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { batches } from '#server/modules/facility/catalogues'
import type { Batch } from '#shared/schemas/facility'
import { PHONE, screenshot, startBrowserSession, type BrowserSession } from '#tests/support/browser'
import { ensureFacilityAndParameters, makeAreaWithTanks, uniqueCode } from '#tests/support/facility-fixtures'

let s: BrowserSession
let tempLimitC: number
beforeAll(async () => {
  s = await startBrowserSession()
  tempLimitC = (await ensureFacilityAndParameters()).arrivalTempDiffLimitC
})
afterAll(() => s?.close())

// 25 juveniles off an invented intake, weighed to 0.1 g.
const WEIGHTS = [
  '3.4',
  '2.9',
  '3.8',
  '3.1',
  '4.2',
  '2.7',
  '3.5',
  '3.3',
  '3.9',
  '2.8',
  '3.6',
  '3.0',
  '4.4',
  '3.2',
  '3.7',
  '2.6',
  '3.5',
  '4.0',
  '3.1',
  '3.3',
  '2.9',
  '3.8',
  '3.4',
  '4.1',
  '3.6',
]

/** The textbook two-pass formulas, written out here so the test does not lean on the app's own code. */
function twoPass(values: number[]) {
  let sum = 0
  for (const v of values) sum += v
  const mean = sum / values.length
  let squares = 0
  for (const v of values) squares += (v - mean) * (v - mean)
  return { n: values.length, mean, sd: Math.sqrt(squares / (values.length - 1)) }
}

async function makeBatch() {
  const { tanks } = await makeAreaWithTanks(1, { quarantine: true })
  return batches.create({
    code: uniqueCode('BW'),
    species: 'Barramundi (Lates calcarifer)',
    origin: 'Invented hatchery',
    arrivalDate: '2026-11-20',
    count: 1200,
    meanWeightG: 2.5,
    tankIds: [tanks[0].id],
    status: 'quarantine',
    feedRatePct: 4,
  })
}

describe('Sample weighing', () => {
  test('a technician weighs 25 fish on a phone, sees n, mean and SD as they go, saves, and the batch mean follows', async () => {
    const batch = await makeBatch()
    const tech = await s.createPerson('technician')
    const { page, context } = await s.newPage(PHONE)
    await s.signIn(page, tech.email)
    await page.goto(`/batches/${batch.id}`)
    await page.getByRole('heading', { name: `Batch ${batch.code}` }).waitFor()
    await page.getByRole('button', { name: 'Sample weighing' }).click()

    const stat = (name: string) => page.getByTestId(`stat-${name}`)
    const box = page.getByLabel(/^Weight of fish \d+ \(g\)$/)
    for (const [index, weight] of WEIGHTS.entries()) {
      await box.fill(weight)
      await box.press('Enter')
      await expect.poll(() => stat('n').textContent()).toBe(String(index + 1))
      expect(await box.inputValue()).toBe('')
      if (index === 9) {
        const first10 = twoPass(WEIGHTS.slice(0, 10).map(Number))
        expect(await stat('mean').textContent()).toBe(first10.mean.toFixed(2))
        expect(await stat('sd').textContent()).toBe(first10.sd.toFixed(2))
        await screenshot(page, 'weighing-phone-10-fish')
      }
    }
    // A typo is caught and can be deleted: 34 instead of 3.4.
    await box.fill('34')
    await box.press('Enter')
    await page.getByRole('button', { name: 'Delete fish 26 (34 g)' }).click()

    // A reload (or a dropped phone) keeps the weights typed so far.
    await page.reload()
    const expected = twoPass(WEIGHTS.map(Number))
    await expect.poll(() => stat('n').textContent()).toBe('25')
    expect(await stat('mean').textContent()).toBe(expected.mean.toFixed(2))
    expect(await stat('sd').textContent()).toBe(expected.sd.toFixed(2))
    expect(await stat('range').textContent()).toBe('2.6–4.4')
    await page
      .getByTestId('sample-size')
      .getByText(/Sample size needed for ±10 % at 95 %: \d+ fish/)
      .waitFor()
    await page.getByText('±5 %').click()
    await page
      .getByTestId('sample-size')
      .getByText(/±5 % at 95 %/)
      .waitFor()
    await screenshot(page, 'weighing-phone-25-fish')

    await page.getByRole('button', { name: 'Save weighing (25 fish)' }).click()
    await page.getByText(/Saved the weighing of 25 fish/).waitFor()
    await expect.poll(() => stat('n').textContent()).toBe('0')
    const rounded = Math.round(expected.mean * 100) / 100
    await expect.poll(() => page.getByTestId('batch-mean').textContent()).toBe(`${rounded} g`)
    await page.getByRole('list', { name: 'Batch record' }).getByText('Sample weighing, 25 fish').waitFor()
    await screenshot(page, 'weighing-phone-saved')

    const res = await page.request.get(`/api/batches/${batch.id}`)
    expect(res.status()).toBe(200)
    const after = (await res.json()) as Batch
    expect(after.meanWeightG).toBeCloseTo(expected.mean, 2)
    expect(after.meanWeightG).toBe(rounded)
    await context.close()
  })

  test('the arrival checks on the same page warn as the readings are typed', async () => {
    const batch = await makeBatch()
    const tech = await s.createPerson('technician')
    const { page, context } = await s.newPage(PHONE)
    await s.signIn(page, tech.email)
    await page.goto(`/batches/${batch.id}?form=box`)
    const box = page.getByRole('form', { name: 'Transport box check' })
    for (const [label, value] of [
      ['Temperature (°C)', '24.5'],
      ['pH', '7.2'],
      ['DO (mg/L)', '4.2'],
      ['Receiving temperature (°C)', '28'],
      ['Receiving pH', '7.9'],
    ]) {
      await box.getByLabel(label, { exact: true }).fill(value)
    }
    await box.getByText(`Temperature differs by 3.5 °C (limit ${tempLimitC} °C)`, { exact: false }).waitFor()
    await box.getByText('pH differs by 0.7 (limit 0.5)', { exact: false }).waitFor()
    await box.getByText('Transport water DO is low (4.2 mg/L)', { exact: false }).waitFor()
    await screenshot(page, 'batch-box-check-phone')
    await box.getByRole('button', { name: 'Save box check' }).click()
    await expect.poll(() => box.getByLabel('Box', { exact: true }).inputValue()).toBe('Box 2')
    expect(await box.getByLabel('Receiving temperature (°C)').inputValue()).toBe('28')
    await page.getByRole('list', { name: 'Batch record' }).getByText('Transport box check: Box 1').waitFor()

    await page.getByRole('button', { name: 'Transport water' }).click()
    const water = page.getByRole('form', { name: 'Transport-water test' })
    for (const [label, value] of [
      ['Temperature (°C)', '28'],
      ['pH', '8.0'],
      ['TAN (mg/L N)', '1.2'],
    ])
      await water.getByLabel(label, { exact: true }).fill(value)
    // Emerson et al. (1975), written out here: pKa = 0.09018 + 2729.92 / T(K); NH3 share = 1 / (1 + 10^(pKa − pH)).
    const pKa = 0.09018 + 2729.92 / (28 + 273.15)
    const nh3 = 1.2 / (1 + 10 ** (pKa - 8))
    await expect.poll(() => water.getByTestId('nh3').textContent()).toBe(`${nh3.toFixed(4)} mg/L NH3-N`)
    await water.getByText(/Fresh-water method/).waitFor()
    await water.getByLabel('Salinity (g/kg)').fill('2')
    await water.getByText(/pH must be on the total scale/).waitFor()
    await screenshot(page, 'batch-water-test-phone')
    await context.close()
  })
})
