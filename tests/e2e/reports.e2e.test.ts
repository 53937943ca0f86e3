import { randomUUID } from 'node:crypto'
import { readFile } from 'node:fs/promises'
import { DateTime } from 'luxon'
import Papa from 'papaparse'
import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { db } from '#server/db/data-source'
import { completeTask } from '#server/modules/completions/completions.service'
import { ParameterEntity } from '#server/modules/parameters/parameter.entities'
import { DEMO_PARAMETERS } from '#seed/demo-parameters'
import { DESKTOP, PHONE, screenshot, startBrowserSession, type BrowserSession } from '#tests/support/browser'
import { ensureFacilityAndParameters, makeAreaWithTanks } from '#tests/support/facility-fixtures'
import { parsedCompletion, makeTankTask, setSystemLimit } from '#tests/support/task-fixtures'

let s: BrowserSession
let zone: string
beforeAll(async () => {
  s = await startBrowserSession()
  zone = (await ensureFacilityAndParameters()).timeZone
  const repo = db().getRepository(ParameterEntity)
  for (const p of DEMO_PARAMETERS.filter((d) => d.key === 'do_mgL' || d.key === 'temp_c')) {
    if (!(await repo.findOneBy({ key: p.key })))
      await repo.save(
        repo.create({ key: p.key, name: p.name, unit: p.unit, decimals: p.decimals, physicalMin: p.physicalMin, physicalMax: p.physicalMax, derived: false }),
      )
  }
})
afterAll(() => s?.close())

/** Three past days in one fresh area: on time, late, missed, skipped, held, and a critical reading. */
async function arrange() {
  const tag = randomUUID().slice(0, 6)
  const supervisor = await s.createPerson('supervisor')
  const tech = await s.createPerson('technician')
  const { area, system, tanks } = await makeAreaWithTanks(2, { roundOrder: 7 })
  await setSystemLimit(system.id, 'do_mgL', { okMin: 5, okMax: 10.5, criticalMin: 4, criticalMax: null })
  await setSystemLimit(system.id, 'temp_c', { okMin: 26.5, okMax: 31, criticalMin: 24, criticalMax: 33 })
  const day = (ago: number, hour = 9) => DateTime.now().setZone(zone).minus({ days: ago }).set({ hour, minute: 0, second: 0, millisecond: 0 })
  const task = (tank: (typeof tanks)[number], ago: number, extra: Parameters<typeof makeTankTask>[1] = {}) => {
    const due = day(ago)
    return makeTankTask(tank, {
      title: `Welfare check ${tag}`,
      dueAt: due.toJSDate(),
      localDate: due.toISODate()!,
      localStart: due.toFormat("yyyy-MM-dd'T'HH:mm:ss"),
      ...extra,
    })
  }
  const doneAt = (ago: number, minutes: number) => day(ago).plus({ minutes }).toUTC().toISO()!
  const ok = { do_mgL: 6.5, temp_c: 28 }
  await completeTask((await task(tanks[0], 5)).id, supervisor, parsedCompletion(ok, { doneAt: doneAt(5, -5), performedById: tech.id }))
  await completeTask((await task(tanks[1], 5)).id, supervisor, parsedCompletion(ok, { doneAt: doneAt(5, 25), performedById: tech.id }))
  await task(tanks[0], 4, { status: 'missed' })
  await completeTask(
    (await task(tanks[1], 4)).id,
    supervisor,
    parsedCompletion({}, { outcome: 'skipped', skipReason: 'no_access', doneAt: doneAt(4, 10), performedById: tech.id }),
  )
  await task(tanks[0], 3, { status: 'held', heldReason: 'Fasting before dispatch' })
  const critical = await task(tanks[1], 3, { title: `Oxygen check ${tag}` })
  await completeTask(critical.id, supervisor, parsedCompletion({ do_mgL: 3.1, temp_c: 28 }, { doneAt: doneAt(3, -4), performedById: tech.id }))
  return { tag, area, tanks, critical, from: day(5).toISODate()!, to: day(3).toISODate()! }
}

const cellTexts = (rows: import('playwright-core').Locator) =>
  rows.evaluateAll((trs) => trs.map((tr) => [...tr.querySelectorAll('td')].map((td) => td.textContent?.trim() ?? '')))

describe('reports', () => {
  test('a manager reads compliance for a range, and the CSV download parses back to the same rows', async () => {
    const { tag, area, tanks, critical, from, to } = await arrange()
    const manager = await s.createPerson('manager')
    const { page, context } = await s.newPage(DESKTOP)
    await s.signIn(page, manager.email)
    await page.goto('/reports')
    await page.getByRole('heading', { name: 'Reports', level: 1 }).waitFor()
    expect(await page.getByLabel('To').inputValue()).toBe(DateTime.now().setZone(zone).toISODate())
    expect(await page.getByLabel('From').inputValue()).toBe(DateTime.now().setZone(zone).minus({ days: 6 }).toISODate())

    await page.getByLabel('From').fill(from)
    await page.getByLabel('To').fill(to)
    await page.getByRole('button', { name: 'Show' }).click()
    await page.waitForURL((url) => url.searchParams.get('from') === from && url.searchParams.get('to') === to)
    await page.getByLabel('Group by').selectOption('area')
    // Grouping right after picking the dates keeps the dates (it once rebuilt the address from before them).
    await page.waitForURL((url) => url.searchParams.get('by') === 'area')
    expect(new URL(page.url()).searchParams.get('from')).toBe(from)
    expect(new URL(page.url()).searchParams.get('to')).toBe(to)
    await page.getByRole('heading', { name: 'Compliance by area, per day' }).waitFor()

    const table = page.getByRole('table', { name: 'Compliance' })
    const mine = table.getByRole('row').filter({ hasText: area.name })
    await expect.poll(() => mine.count()).toBe(3)
    expect(await cellTexts(mine)).toEqual([
      [from, area.name, '2', '1', '1', '0', '0', '0', '0', '50%'],
      [DateTime.fromISO(from).plus({ days: 1 }).toISODate(), area.name, '2', '0', '0', '1', '1', '0', '0', '0%'],
      [to, area.name, '2', '1', '0', '0', '0', '1', '0', '100%'],
    ])
    await screenshot(page, 'reports-compliance-desktop')

    const api = await page.request.get(`/api/reports/compliance?from=${from}&to=${to}&by=area&period=day`)
    const json = (await api.json()) as Array<Record<string, unknown>>
    const link = page.getByRole('link', { name: 'Download CSV: compliance' })
    expect(await link.getAttribute('href')).toBe(`/api/reports/compliance?from=${from}&to=${to}&by=area&period=day&format=csv`)
    const [download] = await Promise.all([page.waitForEvent('download'), link.click()])
    expect(download.suggestedFilename()).toBe(`compliance-area-${from}-${to}.csv`)
    const parsed = Papa.parse<Record<string, unknown>>(await readFile((await download.path())!, 'utf8'), {
      header: true,
      dynamicTyping: true,
      skipEmptyLines: true,
    })
    expect(parsed.errors).toEqual([])
    expect(parsed.data.map((r) => ({ ...r, onTimeRate: r.onTimeRate === '' ? null : r.onTimeRate }))).toEqual(json)
    const shown = await cellTexts(table.locator('tbody tr'))
    expect(shown.map((r) => [r[0], r[1], r[2]])).toEqual(json.map((r) => [r.period, r.group, String(r.total)]))

    await page.emulateMedia({ media: 'print' })
    await screenshot(page, 'reports-compliance-print')
    await page.emulateMedia({ media: 'screen' })

    await page.getByRole('link', { name: 'Response times' }).click()
    const flagged = page
      .getByRole('table', { name: 'Responses' })
      .getByRole('row')
      .filter({ hasText: `Oxygen check ${tag}` })
    await flagged.getByText('Critical', { exact: true }).waitFor()
    await flagged.getByText('Critical reading').waitFor()
    await screenshot(page, 'reports-responses-desktop')

    await page.getByRole('link', { name: 'Welfare checks' }).click()
    await page.getByText('Tanks: All tanks').click()
    await page.getByRole('checkbox', { name: new RegExp(tanks[1].code) }).check()
    await page.getByRole('button', { name: 'Show these tanks' }).click()
    await page.waitForURL((url) => url.searchParams.get('tankIds') === String(tanks[1].id))
    const welfare = page.getByRole('table', { name: 'Welfare checks' }).locator('tbody tr')
    await expect.poll(() => welfare.count()).toBe(3)
    await page
      .getByRole('row')
      .filter({ hasText: `Oxygen check ${tag}` })
      .getByText(/do_mgL=3\.1 mg\/L \(critical\)/)
      .waitFor()
    expect(await page.getByRole('link', { name: 'Download CSV: welfare checks' }).getAttribute('href')).toContain(`tankIds=${tanks[1].id}&format=csv`)
    await screenshot(page, 'reports-welfare-desktop')

    // A correction of the critical record shows on the audit trail with its before and after.
    const history = await (await page.request.get(`/api/tasks/${critical.id}/completion`)).json()
    const amend = await page.request.post(`/api/completions/${history.completion.id}/amendments`, {
      data: { reason: 'Meter misread, probe re-tested', readings: { do_mgL: 5.4 } },
      headers: { origin: s.url },
    })
    expect(amend.status()).toBe(201)
    await page.goto('/audit?entity=completion')
    const entry = page.locator('details').filter({ hasText: `Corrected completion ${history.completion.id}` })
    await entry.locator(':scope > summary').click()
    const reason = entry.getByRole('row').filter({ hasText: 'reason' })
    expect(await reason.locator('td').allTextContents()).toEqual(['—', 'Meter misread, probe re-tested'])
    await entry.getByRole('row').filter({ hasText: 'readings' }).getByText('changed').waitFor()
    await screenshot(page, 'audit-desktop')
    await context.close()

    const phone = await s.newPage(PHONE)
    await s.signIn(phone.page, manager.email)
    await phone.page.goto(`/reports?from=${from}&to=${to}&by=person&period=week`)
    await phone.page.getByRole('heading', { name: 'Compliance by person, per week' }).waitFor()
    await screenshot(phone.page, 'reports-phone')
    await phone.context.close()
  })

  test('a technician is told the reports are not for their role', async () => {
    const tech = await s.createPerson('technician')
    const { page, context } = await s.newPage(DESKTOP)
    await s.signIn(page, tech.email)
    await page.goto('/reports')
    await page.getByText('Not for your role').waitFor()
    await context.close()
  })
})
