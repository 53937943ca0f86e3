import { DateTime } from 'luxon'
import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { db } from '#server/db/data-source'
import { completeTask } from '#server/modules/completions/completions.service'
import { ParameterEntity } from '#server/modules/parameters/parameter.entities'
import { DEMO_PARAMETERS } from '#seed/demo-parameters'
import type { Tank } from '#shared/schemas/facility'
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

/**
 * Yesterday's round for one technician across two areas: the quarantine room has the lower round
 * order and its tasks were made first and fall due earliest, yet it must come last on paper.
 */
async function arrange() {
  const tech = await s.createPerson('technician', { name: 'Mere Kahu' })
  const quarantine = await makeAreaWithTanks(1, { quarantine: true, roundOrder: 1 })
  const nursery = await makeAreaWithTanks(2, { roundOrder: 20 })
  for (const { system } of [quarantine, nursery]) {
    await setSystemLimit(system.id, 'do_mgL', { okMin: 5, okMax: 10.5, criticalMin: 4, criticalMax: null })
    await setSystemLimit(system.id, 'temp_c', { okMin: 26.5, okMax: 31, criticalMin: 24, criticalMax: 33 })
  }
  const date = DateTime.now().setZone(zone).minus({ days: 1 }).toISODate()!
  const at = (tank: Tank, time: string, title: string) => {
    const due = DateTime.fromISO(`${date}T${time}`, { zone })
    return makeTankTask(tank, { title, assigneeId: tech.id, dueAt: due.toJSDate(), localDate: date, localStart: due.toFormat("yyyy-MM-dd'T'HH:mm:ss") })
  }
  const q1 = await at(quarantine.tanks[0], '06:00', 'Quarantine bin check')
  const n1 = await at(nursery.tanks[0], '07:00', 'Nursery tank check')
  const n2 = await at(nursery.tanks[1], '07:10', 'Nursery tank check')
  return { tech, date, quarantine, nursery, tasks: { q1, n1, n2 } }
}

describe('the round sheet', () => {
  test('prints in walking order with the quarantine area last, and a supervisor types the paper back in', async () => {
    const { tech, date, quarantine, nursery, tasks } = await arrange()
    const supervisor = await s.createPerson('supervisor')
    const { page, context } = await s.newPage(DESKTOP)
    await s.signIn(page, supervisor.email)
    await page.goto(`/round-sheet?date=${date}&personId=${tech.id}`)
    const sheet = page.getByRole('article', { name: 'Round sheet' })
    await sheet.getByRole('heading', { name: `Round sheet · ${tech.name}` }).waitFor()
    expect(await sheet.getByRole('heading', { level: 3 }).allTextContents()).toEqual([
      `1. ${nursery.area.name}`,
      `2. ${quarantine.area.name} Quarantine: walk it last`,
    ])
    const order = await sheet.getByRole('listitem').evaluateAll((items) => items.map((li) => li.textContent ?? ''))
    expect(order.map((text) => text.slice(0, 5))).toEqual(['07:00', '07:10', '06:00'])
    expect(order[0]).toContain(nursery.tanks[0].code)
    expect(order[2]).toContain(quarantine.tanks[0].code)
    const firstTask = sheet.getByRole('listitem').first()
    await firstTask.getByText('Dissolved oxygen').waitFor()
    await firstTask.getByText('ok 5–10.5').waitFor()
    await firstTask.getByText('Initials').waitFor()
    await screenshot(page, 'round-sheet-desktop')

    await page.emulateMedia({ media: 'print' })
    expect(await page.getByRole('navigation', { name: 'Main' }).isVisible()).toBe(false)
    expect(await page.getByRole('button', { name: 'Print' }).isVisible()).toBe(false)
    await screenshot(page, 'round-sheet-print')
    await page.emulateMedia({ media: 'screen' })

    await page.getByRole('button', { name: 'Type in a paper sheet' }).click()
    await page.waitForURL((url) => url.searchParams.get('mode') === 'enter')
    const form = (code: string) => page.getByRole('form', { name: new RegExp(code) })

    const first = form(nursery.tanks[0].code)
    await first.getByLabel('Dissolved oxygen (mg/L)').fill('3.6')
    await first.getByLabel('Temperature (°C)').fill('28.1')
    await first.getByRole('button', { name: 'Save this task' }).click()
    await first.getByText('Use the time on the sheet, HH:MM').waitFor()
    await first.getByLabel('Time on paper').fill('07:04')
    expect(await first.getByLabel('Done by').inputValue()).toBe(String(tech.id))
    await first.getByRole('button', { name: 'Save this task' }).click()
    const saved = page.getByRole('status').filter({ hasText: 'Saved: done at 07:04 by Mere Kahu' })
    await saved.waitFor()
    await saved.getByText(/Flag: Critical \(Dissolved oxygen 3\.6 mg\/L, DO saturation/).waitFor()

    const second = form(nursery.tanks[1].code)
    await second.getByLabel('Dissolved oxygen (mg/L)').fill('99')
    await second.getByLabel('Temperature (°C)').fill('27.5')
    await second.getByLabel('Time on paper').fill('07:15')
    await second.getByRole('button', { name: 'Save this task' }).click()
    await second.getByText('Not possible: must be 0–30').waitFor()
    await second.getByLabel('Dissolved oxygen (mg/L)').fill('7.9')
    await second.getByRole('button', { name: 'Save this task' }).click()
    await page.getByRole('status').filter({ hasText: 'Saved: done at 07:15 by Mere Kahu' }).waitFor()

    // Someone finishes the quarantine bin in the app while the supervisor is typing: the server refuses, and says why.
    const third = form(quarantine.tanks[0].code)
    await third.getByLabel('Dissolved oxygen (mg/L)').fill('7.2')
    await third.getByLabel('Temperature (°C)').fill('28')
    await third.getByLabel('Time on paper').fill('06:10')
    await completeTask(
      tasks.q1.id,
      supervisor,
      parsedCompletion({ do_mgL: 7, temp_c: 28 }, { doneAt: DateTime.fromISO(`${date}T06:20`, { zone }).toUTC().toISO() }),
    )
    await third.getByRole('button', { name: 'Save this task' }).click()
    await third
      .getByRole('alert')
      .getByText(/Not saved: already done in Roundtide by .* at 06:20\./)
      .waitFor()
    await screenshot(page, 'round-sheet-type-in-desktop')

    const record = await (await page.request.get(`/api/tasks/${tasks.n1.id}/completion`)).json()
    expect(record.completion).toMatchObject({
      personId: tech.id,
      enteredById: supervisor.id,
      doneAt: DateTime.fromISO(`${date}T07:04`, { zone }).toUTC().toISO(),
    })
    expect(record.readings.find((r: { parameterKey: string }) => r.parameterKey === 'do_mgL')).toMatchObject({ value: 3.6, band: 'critical' })
    await context.close()

    const phone = await s.newPage(PHONE)
    await s.signIn(phone.page, supervisor.email)
    await phone.page.goto(`/round-sheet?date=${date}&personId=${tech.id}`)
    await phone.page.getByRole('article', { name: 'Round sheet' }).getByText('Already done in Roundtide', { exact: false }).first().waitFor()
    await screenshot(phone.page, 'round-sheet-phone')
    await phone.page.getByRole('button', { name: 'Type in a paper sheet' }).click()
    await phone.page.getByText('Already done in Roundtide at 07:04 by Mere Kahu').waitFor()
    await screenshot(phone.page, 'round-sheet-type-in-phone')
    await phone.context.close()
  })
})
