import { randomUUID } from 'node:crypto'
import { DateTime } from 'luxon'
import type { Page } from 'playwright-core'
import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { db } from '#server/db/data-source'
import { areas, tanks } from '#server/modules/facility/catalogues'
import { createFacilityIfMissing } from '#server/modules/facility/facility.service'
import { ParameterEntity } from '#server/modules/parameters/parameter.entities'
import { createRoutine, updateRoutine } from '#server/modules/routines/routines.service'
import type { Parameter } from '#shared/schemas/parameter'
import { RoutineInputSchema, UpdateRoutineInputSchema } from '#shared/schemas/routine'
import type { Task } from '#shared/schemas/task'
import { DESKTOP, screenshot, startBrowserSession, type BrowserSession } from '#tests/support/browser'

const NARROW_PHONE = { width: 360, height: 780 }

const READINGS: Array<Pick<Parameter, 'key' | 'name' | 'unit' | 'decimals' | 'physicalMin' | 'physicalMax' | 'derived'>> = [
  { key: 'do_mgL', name: 'Dissolved oxygen', unit: 'mg/L', decimals: 1, physicalMin: 0, physicalMax: 30, derived: false },
  { key: 'temp_c', name: 'Temperature', unit: '°C', decimals: 1, physicalMin: -2, physicalMax: 45, derived: false },
]

let s: BrowserSession
beforeAll(async () => {
  s = await startBrowserSession()
})
afterAll(() => s?.close())

/** The shared test DB may already hold a facility in another zone; its zone is read back, not assumed. */
async function facilityAndTag() {
  const facility = await createFacilityIfMissing({
    name: 'Routine test station',
    timeZone: 'Australia/Brisbane',
    handoverTime: '07:00',
    quarantineDays: 30,
    arrivalTempDiffLimitC: 2,
    minOxygenHours: 24,
  })
  return { facility, tag: randomUUID().slice(0, 6).toUpperCase(), today: DateTime.now().setZone(facility.timeZone).toISODate()! }
}

/** Three fresh tanks in a fresh area, the two readings the routine needs, and two neighbours for the list. */
async function arrange() {
  const { facility, tag, today } = await facilityAndTag()
  const area = await areas.create({ code: `RT${tag}`, name: `Routine hall ${tag}`, roundOrder: 900, quarantine: false })
  const tankCodes = [1, 2, 3].map((n) => `RT${tag}-T${n}`)
  const tankIds: number[] = []
  for (const code of tankCodes) {
    tankIds.push(
      (await tanks.create({ code, name: `Trial tank ${code.slice(-1)}`, areaId: area.id, systemId: null, volumeL: 400, kind: 'tank', inUse: true })).id,
    )
  }
  const repo = db().getRepository(ParameterEntity)
  for (const reading of READINGS) {
    if (!(await repo.findOneBy({ key: reading.key }))) await repo.save(repo.create(reading))
  }
  const parameters = await repo.findBy(READINGS.map(({ key }) => ({ key })))
  // Neighbours for the list: one welfare-critical, one paused.
  await createRoutine(
    RoutineInputSchema.parse({
      name: `Morning tank check ${tag}`,
      category: 'welfare',
      targetKind: 'area_tanks',
      targetIds: [area.id],
      rrule: 'FREQ=DAILY',
      dtstart: `${today}T07:30:00`,
      priority: 'welfare_critical',
      requiredReadings: ['do_mgL'],
    }),
  )
  await createRoutine(
    RoutineInputSchema.parse({
      name: `Stores count ${tag}`,
      category: 'stores',
      targetKind: 'facility',
      rrule: 'FREQ=WEEKLY;BYDAY=FR',
      dtstart: `${today}T11:00:00`,
      paused: true,
    }),
  )
  return { timeZone: facility.timeZone, tag, tankCodes, tankIds, parameters }
}

const longDate = (isoDate: string) => {
  const d = new Date(`${isoDate}T00:00:00Z`)
  const weekday = new Intl.DateTimeFormat('en-GB', { weekday: 'long', timeZone: 'UTC' }).format(d)
  return `${weekday} ${new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric', timeZone: 'UTC' }).format(d)}`
}

async function previewTimes(page: Page) {
  const rows = page.getByRole('table', { name: 'Next 10 dates' }).getByRole('row')
  const cells = await rows.evaluateAll((trs) => trs.slice(1).map((tr) => [...tr.querySelectorAll('td')].map((td) => td.textContent?.trim())))
  return cells
}

describe('Routines', () => {
  test('a manager builds a Monday, Wednesday and Friday routine and its tasks appear for next Monday', async () => {
    const { timeZone, tag, tankCodes, tankIds, parameters } = await arrange()
    const manager = await s.createPerson('manager')
    const { page, context } = await s.newPage(DESKTOP)
    await s.signIn(page, manager.email)
    await page.goto('/routines')
    await page.getByRole('link', { name: 'New routine' }).click()
    await page.getByRole('heading', { name: 'New routine' }).waitFor()

    const name = `Water check ${tag}`
    await page.getByLabel('Name').fill(name)
    await page.getByLabel('Category').selectOption({ label: 'Water quality' })
    await page.getByLabel('Target kind').selectOption({ label: 'Tanks' })
    for (const code of tankCodes) await page.getByRole('checkbox', { name: new RegExp(code) }).check()

    await page.getByLabel('Repeats').selectOption({ label: 'Every week on chosen days' })
    for (const day of ['Monday', 'Wednesday', 'Friday']) await page.getByRole('checkbox', { name: day, exact: true }).check()
    await page.getByLabel('Time of day 1').fill('10:15')
    const summary = page.getByTestId('rule-summary')
    await expect.poll(() => summary.textContent()).toBe('Every week on Monday, Wednesday and Friday at 10:15')
    await expect.poll(async () => (await previewTimes(page)).length).toBe(10)
    for (const [day, , time] of await previewTimes(page)) {
      expect(['Mon', 'Wed', 'Fri']).toContain(day)
      expect(time).toBe('10:15')
    }
    expect(await page.getByLabel('Start time').inputValue()).toBe('10:15')

    // The written rule shows what the builder made; a broken one is explained, not fatal.
    await page.getByRole('button', { name: 'Written rule' }).click()
    const written = page.getByLabel('Written rule (RRULE)')
    expect(await written.inputValue()).toBe('FREQ=WEEKLY;BYDAY=MO,WE,FR;BYHOUR=10;BYMINUTE=15')
    await written.fill('FREQ=WEEKLY;BYDAY=2MO')
    await page.getByText('BYDAY with a position (like 2MO) needs FREQ=MONTHLY or FREQ=YEARLY').waitFor()
    await screenshot(page, 'routine-invalid-rule-desktop')
    await written.fill('FREQ=WEEKLY;BYDAY=MO,WE,FR;BYHOUR=10;BYMINUTE=15')
    await page.getByRole('button', { name: 'Builder' }).click()
    await expect.poll(() => summary.textContent()).toBe('Every week on Monday, Wednesday and Friday at 10:15')

    for (const p of parameters) await page.getByRole('checkbox', { name: `${p.name} (${p.unit})` }).check()
    await screenshot(page, 'routine-new-desktop')
    await page.getByRole('button', { name: 'Save routine' }).click()
    await page.waitForURL(/\/routines\/\d+$/)
    const routineId = Number(new URL(page.url()).pathname.split('/').pop())

    const today = DateTime.now().setZone(timeZone)
    const nextMonday = today.plus({ days: 8 - today.weekday }).toISODate()!
    const mondayTasks = page.getByRole('region', { name: longDate(nextMonday) }).getByRole('listitem')
    await expect.poll(() => mondayTasks.count()).toBe(3)
    for (const [index, code] of tankCodes.entries()) {
      expect(await mondayTasks.nth(index).textContent()).toMatch(new RegExp(`^10:15${code}`))
    }
    await screenshot(page, 'routine-saved-desktop')

    const res = await page.request.get(`/api/tasks?routineId=${routineId}&date=${nextMonday}`)
    expect(res.status()).toBe(200)
    const tasks = (await res.json()) as Task[]
    const dueAt = DateTime.fromISO(`${nextMonday}T10:15:00`, { zone: timeZone }).toUTC().toISO({ suppressMilliseconds: false })
    expect(tasks).toHaveLength(3)
    expect(tasks.map((t) => t.tankId).sort()).toEqual([...tankIds].sort())
    for (const t of tasks) {
      expect(t).toMatchObject({ localDate: nextMonday, localTime: '10:15', dueAt, title: name })
      expect([...t.requiredReadings].sort()).toEqual(['do_mgL', 'temp_c'])
    }

    await page.goto('/routines')
    const row = (text: string) => page.getByRole('link', { name: new RegExp(text) })
    await row(`Morning tank check ${tag}`).getByText('Every day at 07:30').waitFor()
    await row(`Morning tank check ${tag}`).getByText('Welfare-critical').waitFor()
    await row(`Morning tank check ${tag}`).getByText('Every tank in 1 area').waitFor()
    await row(`Stores count ${tag}`).getByText('Paused').waitFor()
    await screenshot(page, 'routines-list-desktop')
    await page.getByLabel('Category').selectOption('water_quality')
    await row(name).getByText('Every week on Monday, Wednesday and Friday at 10:15').waitFor()
    await page.getByText(`Morning tank check ${tag}`).waitFor({ state: 'detached' })
    expect(new URL(page.url()).search).toBe('?category=water_quality')
    await context.close()

    const phone = await s.newPage(NARROW_PHONE)
    await s.signIn(phone.page, manager.email)
    await phone.page.goto('/routines')
    await phone.page.getByRole('link', { name: new RegExp(name) }).waitFor()
    await screenshot(phone.page, 'routines-list-phone')
    await phone.page.goto(`/routines/${routineId}`)
    await phone.page.getByRole('region', { name: longDate(nextMonday) }).waitFor()
    await screenshot(phone.page, 'routine-saved-phone')
    await phone.context.close()
  })

  test('when someone else saved first, a supervisor is told and can reload their version', async () => {
    const { tag, today } = await facilityAndTag()
    const input = {
      name: `Alarm call-out test ${tag}`,
      category: 'alarms',
      targetKind: 'facility',
      rrule: 'FREQ=WEEKLY;BYDAY=FR',
      dtstart: `${today}T14:00:00`,
    } as const
    const routine = await createRoutine(RoutineInputSchema.parse(input))
    const supervisor = await s.createPerson('supervisor')
    const { page, context } = await s.newPage(DESKTOP)
    await s.signIn(page, supervisor.email)
    await page.goto(`/routines/${routine.id}`)
    await expect.poll(() => page.getByLabel('Default assignee').locator('option').allTextContents()).not.toContain('A named person')
    await page.getByLabel('Name').fill(`Alarm test, renamed here ${tag}`)

    await updateRoutine(routine.id, UpdateRoutineInputSchema.parse({ ...input, instructions: 'Changed in the other office', version: routine.version }))
    await page.getByRole('button', { name: 'Save changes' }).click()
    await page.getByText('Someone else changed this routine after you opened it.').waitFor()
    await screenshot(page, 'routine-conflict-desktop')
    await page.getByRole('button', { name: 'Reload routine' }).click()
    await expect.poll(() => page.getByLabel('Instructions').inputValue()).toBe('Changed in the other office')
    expect(await page.getByLabel('Name').inputValue()).toBe(input.name)

    await page.getByLabel('Name').fill(`Alarm test, renamed here ${tag}`)
    await page.getByRole('button', { name: 'Save changes' }).click()
    await page.getByRole('heading', { name: `Alarm test, renamed here ${tag}` }).waitFor()
    await context.close()
  })
})
