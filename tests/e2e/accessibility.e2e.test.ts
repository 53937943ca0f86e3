import AxeBuilder from '@axe-core/playwright'
import { DateTime } from 'luxon'
import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { batches } from '#server/modules/facility/catalogues'
import { createRoutine } from '#server/modules/routines/routines.service'
import { listIncidents, proposeIncident } from '#server/modules/incidents/incidents.service'
import { addHandoverNote } from '#server/modules/roster/on-call.service'
import { recordMovement } from '#server/modules/stock/stock.service'
import { toPerson } from '#server/modules/people/person.mapper'
import { getPersonRow } from '#server/modules/people/people.service'
import { DESKTOP, PHONE, startBrowserSession, type BrowserSession } from '#tests/support/browser'
import { ensureFacilityAndParameters, makeAreaWithTanks, routineData } from '#tests/support/facility-fixtures'
import { makeTankTask } from '#tests/support/task-fixtures'
import { MovementInputSchema } from '#shared/schemas/stock'

let s: BrowserSession
let pages: string[]
let managerEmail: string
const SCRIPT = '<script>window.__stored = 1</script><img src=x onerror="window.__stored = 2">'

beforeAll(async () => {
  s = await startBrowserSession()
  const facility = await ensureFacilityAndParameters()
  const { area, tanks } = await makeAreaWithTanks(2)
  const today = DateTime.now().setZone(facility.timeZone).toISODate()!
  const manager = await s.createPerson('manager')
  managerEmail = manager.email
  const task = await makeTankTask(tanks[0], { localDate: today, assigneeId: manager.id, title: `Check ${SCRIPT}` })
  const batch = await batches.create({
    code: 'B-A11Y',
    species: 'Barramundi',
    origin: SCRIPT,
    arrivalDate: today,
    count: 100,
    meanWeightG: 5,
    tankIds: [tanks[0].id],
    status: 'active',
    feedRatePct: 2,
  })
  const routine = await createRoutine(routineData({ name: `Routine ${SCRIPT}`, targetIds: [tanks[0].id], instructions: SCRIPT }))
  await addHandoverNote(toPerson(await getPersonRow(manager.id)), { text: `Watch bin 2 ${SCRIPT}` })
  await recordMovement(
    toPerson(await getPersonRow(manager.id)),
    MovementInputSchema.parse({ kind: 'arrival', batchId: batch.id, toTankId: tanks[0].id, count: 100, origin: SCRIPT }),
  )
  await proposeIncident(
    {
      source: 'missed_task',
      sourceKey: `a11y:${task.id}`,
      taskId: task.id,
      title: `Missed ${SCRIPT}`,
      whatHappened: SCRIPT,
      startedAt: new Date(),
      tankIds: [tanks[0].id],
    },
    new Date(),
  )
  pages = [
    '/round',
    `/board?date=${today}`,
    '/calendar',
    '/on-call',
    '/tanks',
    `/tanks/${tanks[0].id}`,
    '/routines',
    `/routines/${routine.id}`,
    '/routines/new',
    '/playbooks',
    '/oxygen',
    '/calculators',
    '/roster',
    '/reports',
    '/audit',
    `/round-sheet?date=${today}&areaId=${area.id}`,
    `/labels?areaId=${area.id}`,
    '/people',
    '/outbox',
    '/settings',
    `/tasks/${task.id}`,
    `/batches/${batch.id}`,
    '/incidents',
    `/incidents/${(await listIncidents())[0].id}`,
  ]
}, 120_000)
afterAll(() => s?.close())

describe.each([
  ['phone', PHONE],
  ['desktop', DESKTOP],
])('every page on a %s', (_name, viewport) => {
  test('has no serious or critical accessibility violations, and stored markup never runs', async () => {
    const { page, context } = await s.newPage(viewport)
    const dialogs: string[] = []
    page.on('dialog', (d) => {
      dialogs.push(d.message())
      void d.dismiss()
    })
    await page.goto('/sign-in')
    const signIn = await new AxeBuilder({ page }).analyze()
    const problems: string[] = signIn.violations
      .filter((v) => v.impact === 'serious' || v.impact === 'critical')
      .map((v) => `/sign-in: ${v.id} (${v.nodes.length})`)
    await s.signIn(page, managerEmail)
    for (const path of pages) {
      await page.goto(path)
      // Live pages keep a socket open, so wait for the page's heading rather than a quiet network.
      await page.locator('h1').first().waitFor({ timeout: 15_000 })
      await page.waitForTimeout(400)
      const result = await new AxeBuilder({ page }).analyze()
      for (const v of result.violations.filter((x) => x.impact === 'serious' || x.impact === 'critical')) {
        problems.push(
          `${path}: ${v.id} — ${v.help} (${v.nodes
            .map((n) => n.target.join(' '))
            .slice(0, 3)
            .join(' | ')})`,
        )
      }
      expect(await page.evaluate(() => (window as unknown as { __stored?: number }).__stored), `stored markup ran on ${path}`).toBeUndefined()
    }
    expect(dialogs).toEqual([])
    expect(problems).toEqual([])
    await context.close()
  }, 240_000)
})
