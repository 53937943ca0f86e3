import { DateTime } from 'luxon'
import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { db } from '#server/db/data-source'
import { completeTask } from '#server/modules/completions/completions.service'
import { batches } from '#server/modules/facility/catalogues'
import { ParameterEntity } from '#server/modules/parameters/parameter.entities'
import { DEMO_PARAMETERS } from '#seed/demo-parameters'
import { DESKTOP, PHONE, screenshot, startBrowserSession, type BrowserSession } from '#tests/support/browser'
import { ensureFacilityAndParameters, makeAreaWithTanks, uniqueCode } from '#tests/support/facility-fixtures'
import { parsedCompletion, makeTankTask, setSystemLimit } from '#tests/support/task-fixtures'

const KEYS = ['do_mgL', 'do_pct', 'temp_c', 'ph', 'mortalities']

let s: BrowserSession
let zone: string
beforeAll(async () => {
  s = await startBrowserSession()
  zone = (await ensureFacilityAndParameters()).timeZone
  // Another test file may have made a few parameters by hand before the demo catalogue went in.
  const repo = db().getRepository(ParameterEntity)
  for (const p of DEMO_PARAMETERS.filter((d) => KEYS.includes(d.key))) {
    if (!(await repo.findOneBy({ key: p.key })))
      await repo.save(
        repo.create({
          key: p.key,
          name: p.name,
          unit: p.unit,
          decimals: p.decimals,
          physicalMin: p.physicalMin,
          physicalMax: p.physicalMax,
          derived: p.derived ?? false,
        }),
      )
  }
})
afterAll(() => s?.close())

/** Ten days of morning checks on one tank, one with DO below the critical limit, and three system chemistry tests. */
async function arrange() {
  const supervisor = await s.createPerson('supervisor')
  const tech = await s.createPerson('technician', { name: 'Rua Tane' })
  const { area, system, tanks } = await makeAreaWithTanks(1, { roundOrder: 5 })
  const tank = tanks[0]
  const batch = await batches.create({
    code: uniqueCode('B'),
    species: 'Barramundi (Lates calcarifer)',
    origin: 'Northside hatchery',
    arrivalDate: DateTime.now().setZone(zone).minus({ days: 40 }).toISODate()!,
    count: 180,
    meanWeightG: 12.5,
    tankIds: [tank.id],
    status: 'active',
    feedRatePct: 3,
  })
  // The demo's limits, pinned on this system so the test does not lean on the facility's.
  for (const p of DEMO_PARAMETERS.filter((d) => KEYS.includes(d.key) && d.bands)) await setSystemLimit(system.id, p.key, p.bands!)
  const doByDay = [6.8, 7.1, 6.5, 3.2, 6.9, 7.4, 4.6, 7, 6.6, 7.2]
  for (const [i, dissolved] of doByDay.entries()) {
    const due = DateTime.now()
      .setZone(zone)
      .minus({ days: i + 1 })
      .set({ hour: 8, minute: 0, second: 0, millisecond: 0 })
    const task = await makeTankTask(tank, {
      title: 'Morning tank check',
      dueAt: due.toJSDate(),
      localDate: due.toISODate()!,
      localStart: due.toFormat("yyyy-MM-dd'T'HH:mm:ss"),
      requiredReadings: ['do_mgL', 'temp_c', 'mortalities'],
      assigneeId: tech.id,
    })
    const readings = { do_mgL: dissolved, temp_c: 28 + (i % 3) * 0.4, mortalities: i % 4 === 0 ? 2 : 0 }
    await completeTask(task.id, supervisor, parsedCompletion(readings, { doneAt: due.plus({ minutes: 6 }).toUTC().toISO(), performedById: tech.id }))
  }
  for (const i of [1, 4, 7]) {
    const due = DateTime.now().setZone(zone).minus({ days: i }).set({ hour: 9, minute: 30, second: 0, millisecond: 0 })
    const task = await makeTankTask(tank, {
      title: 'Loop chemistry',
      targetKind: 'system',
      targetId: system.id,
      tankId: null,
      dueAt: due.toJSDate(),
      localDate: due.toISODate()!,
      localStart: due.toFormat("yyyy-MM-dd'T'HH:mm:ss"),
      requiredReadings: ['ph', 'temp_c'],
    })
    await completeTask(
      task.id,
      supervisor,
      parsedCompletion({ ph: 7.4 + i * 0.05, temp_c: 28.2 }, { doneAt: due.plus({ minutes: 3 }).toUTC().toISO(), performedById: tech.id }),
    )
  }
  return { area, system, tank, batch }
}

describe('the tank page', () => {
  test('shows trend charts with the bands drawn, lists the critical DO reading, and links to the QR label', async () => {
    const { area, system, tank, batch } = await arrange()
    const observer = await s.createPerson('observer')
    const { page, context } = await s.newPage(DESKTOP)
    await s.signIn(page, observer.email)
    await page.goto(`/tanks/${tank.id}`)
    await page.getByRole('heading', { name: `${tank.code} · ${tank.name}`, level: 1 }).waitFor()
    await page.getByText(`${area.name} (${area.code})`).waitFor()

    const oxygen = page.getByRole('region', { name: /^Dissolved oxygen/ })
    const oxygenChart = oxygen.locator('.recharts-wrapper')
    await oxygenChart.locator('svg.recharts-surface').waitFor()
    expect(await oxygenChart.locator('.band-area-ok').count()).toBe(1)
    expect(await oxygenChart.locator('.band-area-watch').count()).toBe(2)
    expect(await oxygenChart.locator('.band-area-critical').count()).toBe(1)
    expect(await oxygenChart.locator('.reading-dot').count()).toBe(10)
    expect(await oxygenChart.locator('.reading-dot-critical').count()).toBe(1)
    expect(await oxygenChart.locator('.reading-dot-watch').count()).toBe(1)
    const flagged = oxygen.getByRole('list', { name: 'Flagged Dissolved oxygen readings' }).getByRole('listitem')
    expect((await flagged.allTextContents()).map((t) => t.trim())).toEqual([
      expect.stringMatching(/^Critical3\.2 mg\/LThis tank · /),
      expect.stringMatching(/^Watch4\.6 mg\/LThis tank · /),
    ])
    await oxygen.getByText('Critical band: below 4 mg/L').waitFor()

    // The system's chemistry sits beside the tank's on the temperature chart, and pH is the system's own.
    const temperature = page.getByRole('region', { name: /^Temperature/ })
    await temperature.getByText('10 tank readings, 3 at the system').waitFor()
    await temperature.getByText(`System ${system.code} (dashed, hollow marks)`).waitFor()
    await page.getByRole('region', { name: /^pH/ }).getByText('0 tank readings, 3 at the system').waitFor()

    // Worked-out values wait to be chosen.
    expect(await page.getByRole('region', { name: /^DO saturation/ }).count()).toBe(0)
    await page.getByRole('button', { name: 'DO saturation' }).click()
    await page
      .getByRole('region', { name: /^DO saturation/ })
      .locator('.band-area-ok')
      .waitFor()
    expect(new URL(page.url()).searchParams.get('show')).toContain('do_pct')

    const deaths = page.getByRole('region', { name: 'Mortalities per day' })
    await deaths.getByText('6 removed in 10 days counted; losses on 3 days.').waitFor()
    expect(await deaths.getByRole('list', { name: 'Days with losses' }).getByRole('listitem').allTextContents()).toEqual(
      Array(3).fill(expect.stringMatching(/: 2$/)),
    )
    expect(await page.getByRole('list', { name: 'Recent tasks' }).getByRole('link').count()).toBe(10)
    await page.getByRole('list', { name: 'Recent tasks' }).getByText('Flag: Critical').waitFor()
    await page.getByRole('link', { name: batch.code }).waitFor()
    await page.getByText('180 fish · mean 12.5 g', { exact: false }).waitFor()
    await screenshot(page, 'tank-page-desktop')
    await oxygen.screenshot({ path: 'test-results/tank-page-oxygen-chart.png' })

    await page.getByRole('button', { name: '7 days' }).click()
    // Seven days back from now: days 1 to 6 for sure, day 7's 08:06 depending on the hour the test runs.
    // The shorter window is a new fetch; on a loaded machine it can take longer than the poll's 1 s default.
    await expect.poll(() => oxygenChart.locator('.reading-dot').count(), { timeout: 10_000 }).toBeLessThan(10)
    expect(await oxygenChart.locator('.reading-dot').count()).toBeGreaterThanOrEqual(6)
    await flagged.filter({ hasText: '3.2 mg/L' }).waitFor()

    await page.getByRole('link', { name: 'QR label' }).click()
    await page.waitForURL(`**/labels?tankId=${tank.id}`)
    await page.getByRole('img', { name: `QR code opening the page of ${tank.code}` }).waitFor()
    await page.getByText(`${s.url}/tanks/${tank.id}`).waitFor()
    await screenshot(page, 'labels-tank-desktop')
    await page.getByLabel('Labels for').selectOption('area')
    await page.getByLabel('Area').selectOption({ label: `${area.name} (${area.code})` })
    await page.waitForURL(`**/labels?areaId=${area.id}`)
    await page.emulateMedia({ media: 'print' })
    await screenshot(page, 'labels-area-print')
    await context.close()

    const phone = await s.newPage(PHONE)
    await s.signIn(phone.page, observer.email)
    await phone.page.goto(`/tanks/${tank.id}?days=90`)
    const phoneOxygen = phone.page.getByRole('region', { name: /^Dissolved oxygen/ })
    await phoneOxygen.locator('.band-area-critical').waitFor()
    await screenshot(phone.page, 'tank-page-phone')
    await phoneOxygen.scrollIntoViewIfNeeded()
    await phone.page.screenshot({ path: 'test-results/tank-page-phone-chart.png' })
    await phone.context.close()
  })
})
