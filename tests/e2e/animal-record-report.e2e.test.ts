import { readFile } from 'node:fs/promises'
import AxeBuilder from '@axe-core/playwright'
import { DateTime } from 'luxon'
import Papa from 'papaparse'
import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { TEST_PASSWORD } from '#seed/factories'
import { seedDemo } from '#seed/seed-demo'
import { DESKTOP, PHONE, screenshot, startBrowserSession, type BrowserSession } from '#tests/support/browser'

// The demo facility's year: its manager prints the committee's report.
let s: BrowserSession
const MANAGER = 'maren.holloway@brackenwater.example'
beforeAll(async () => {
  s = await startBrowserSession()
  await seedDemo(TEST_PASSWORD, () => undefined)
}, 180_000)
afterAll(() => s?.close())

const today = () => DateTime.now().setZone('Australia/Brisbane')
const count = (text: string) => Number(text.replace(/,/g, ''))

describe('the animal record for the ethics committee', () => {
  test('a manager opens the year for one batch, sees numbers that balance, downloads the CSV and prints', async () => {
    const from = today().minus({ days: 364 }).toISODate()!
    const to = today().toISODate()!
    const { page, context } = await s.newPage(DESKTOP)
    await s.signIn(page, MANAGER)
    await page.goto(`/reports?from=${from}&to=${to}`)
    await page.getByRole('link', { name: 'Animal record' }).click()
    await page.getByRole('heading', { name: 'Numbers per batch' }).waitFor()
    await page.getByLabel('Batch', { exact: true }).selectOption({ label: 'B-TRIAL · Barramundi (Lates calcarifer)' })
    await page.waitForURL((url) => url.searchParams.get('batchId') !== null && url.searchParams.get('view') === 'animals')

    const table = page.getByRole('table', { name: 'Numbers per batch and tank' })
    const batchLine = table.getByRole('row').filter({ hasText: 'B-TRIAL · all tanks' })
    await batchLine.waitFor()
    const cells = await batchLine.locator('td').allTextContents()
    // Batch · tank, at start, in, moved in, moved out, died, causes, culled, used, out, corrected, on hand, register
    const [opening, arrived, movedIn, movedOut, died] = cells.slice(1, 6).map(count)
    const [culled, used, dispatched, corrected, onHand] = cells.slice(7, 12).map(count)
    expect(opening + arrived - died - culled - used - dispatched + corrected).toBe(onHand)
    expect(movedIn).toBe(movedOut)
    expect(arrived).toBe(640)
    expect(cells[12]).toBe('Agrees')
    const summary = page.getByRole('list', { name: 'Balance per batch' }).getByRole('listitem')
    await expect.poll(() => summary.count()).toBe(1)
    await summary.getByText(`= ${onHand.toLocaleString('en-GB')} on hand`).waitFor()
    await summary.getByText(/Balances: the register holds/).waitFor()
    // Every tank line adds up to the batch line.
    const tankLines = await table
      .locator('tbody tr')
      .filter({ hasNotText: 'all tanks' })
      .evaluateAll((trs) => trs.map((tr) => [...tr.querySelectorAll('td')].map((td) => td.textContent ?? '')))
    expect(tankLines.length).toBeGreaterThan(12)
    expect(tankLines.reduce((sum, line) => sum + count(line[11]), 0)).toBe(onHand)

    const deadlines = page.getByRole('table', { name: 'Incidents and their deadlines' })
    await deadlines.getByRole('row').filter({ hasText: 'NUR-T02' }).getByText('Met', { exact: true }).first().waitFor()
    await deadlines.getByRole('row').filter({ hasText: 'TRL-A07' }).getByText('Missed, done late').first().waitFor()
    await screenshot(page, 'animal-record-desktop')
    const axe = await new AxeBuilder({ page }).analyze()
    expect(
      axe.violations
        .filter((v) => v.impact === 'serious' || v.impact === 'critical')
        .map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(' ')).join(' | ')}`),
    ).toEqual([])

    const link = page.getByRole('link', { name: 'Download CSV: numbers per batch' })
    const [download] = await Promise.all([page.waitForEvent('download'), link.click()])
    expect(download.suggestedFilename()).toBe(`stock-${from}-${to}.csv`)
    const parsed = Papa.parse<Record<string, unknown>>(await readFile((await download.path())!, 'utf8'), {
      header: true,
      dynamicTyping: true,
      skipEmptyLines: true,
    })
    expect(parsed.errors).toEqual([])
    const json = await (await page.request.get(`/api/reports/stock?${new URL(page.url()).searchParams}`)).json()
    expect(parsed.data.map((r) => ({ ...r, diedByCause: r.diedByCause ?? '' }))).toEqual(json)

    await page.emulateMedia({ media: 'print' })
    expect(await page.getByRole('navigation', { name: 'Reports' }).isVisible()).toBe(false)
    expect(await link.isVisible()).toBe(false)
    await page.getByText(/Animal record: numbers per batch and incidents ·/).waitFor()
    await screenshot(page, 'animal-record-print')
    await context.close()

    const phone = await s.newPage(PHONE)
    await s.signIn(phone.page, MANAGER)
    await phone.page.goto(`/reports?view=animals&from=${from}&to=${to}`)
    await phone.page.getByRole('list', { name: 'Balance per batch' }).getByText('B-SPR-25').waitFor()
    await screenshot(phone.page, 'animal-record-phone')
    await phone.context.close()
  })
})
