import { DateTime } from 'luxon'
import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { DESKTOP, PHONE, screenshot, type BrowserSession, startBrowserOnFacility } from '#tests/support/browser'
import { makeAreaWithTanks } from '#tests/support/facility-fixtures'

let s: BrowserSession
let zone: string
beforeAll(async () => ({ s, zone } = await startBrowserOnFacility()))
afterAll(() => s?.close())

const local = (d: DateTime) => d.setZone(zone).toFormat("yyyy-MM-dd'T'HH:mm")

describe('an incident Roundtide cannot see, filed by hand', () => {
  test('a supervisor files an escape of 2 fish from a tank on a phone; a refusal and a lost connection keep what was typed; the incident counts down on phone and desktop', async () => {
    const supervisor = await s.createPerson('supervisor', { name: 'Tui Marsden' })
    const { tanks } = await makeAreaWithTanks(2)
    const tank = tanks[1]

    const phone = await s.newPage(PHONE)
    await s.signIn(phone.page, supervisor.email)
    await phone.page.goto('/incidents')
    await phone.page.getByRole('link', { name: 'File an incident' }).click()
    const form = phone.page.getByRole('form', { name: 'File an incident' })
    await form.waitFor()
    await form.getByLabel('What happened, in a few words').fill(`Escape from ${tank.code}`)
    await form.getByLabel('Describe what happened').fill('Two fish jumped the rim during the net change and went down the floor drain.')
    await form.getByLabel('Started (best estimate)').fill(local(DateTime.now().minus({ minutes: 20 })))
    // A slip of the thumb: noticed tomorrow. Only the server knows the time, so it refuses.
    await form.getByLabel('Noticed').fill(local(DateTime.now().plus({ days: 1 })))
    await form.getByLabel('Tanks involved').selectOption(String(tank.id))
    await form.getByLabel('Animals affected').fill('2')
    await form.getByLabel('Immediate actions').fill('Drain grate checked; lid back on the tank; both fish counted as lost.')
    await form.getByRole('button', { name: 'File the incident' }).click()
    await form.getByRole('alert').getByText('Nothing was filed: an incident cannot start or be noticed in the future.').waitFor()
    await form.getByText('Not in the future').waitFor()
    expect(await form.getByLabel('What happened, in a few words').inputValue()).toBe(`Escape from ${tank.code}`)
    expect(await form.getByLabel('Animals affected').inputValue()).toBe('2')
    expect(await form.getByLabel('Tanks involved').evaluate((el) => [...(el as HTMLSelectElement).selectedOptions].map((o) => o.value))).toEqual([
      String(tank.id),
    ])
    await screenshot(phone.page, 'incident-filing-phone-refused')

    // The connection drops as it is sent: nothing is filed, nothing typed is lost.
    await form.getByLabel('Noticed').fill(local(DateTime.now()))
    await phone.context.setOffline(true)
    await form.getByText('You are offline.', { exact: false }).waitFor()
    await form.getByRole('button', { name: 'File the incident' }).click()
    await form.getByRole('alert').getByText('Not filed: no connection to Roundtide.').waitFor()
    expect(await form.getByLabel('Describe what happened').inputValue()).toContain('Two fish jumped the rim')
    await screenshot(phone.page, 'incident-filing-phone-offline')
    await phone.context.setOffline(false)

    await form.getByRole('button', { name: 'File the incident' }).click()
    await phone.page.getByRole('heading', { name: new RegExp(`^Incident #\\d+: Escape from ${tank.code}$`) }).waitFor()
    await phone.page.getByRole('main').getByText('Open', { exact: true }).waitFor()
    const deadlines = phone.page.getByRole('region', { name: 'Deadlines' })
    expect(await deadlines.textContent()).toMatch(
      /Tell the welfare officer: 23 h \d+ min left.*Report to the ethics committee: 2 d 23 h left.*Full report: 6 d 23 h left/,
    )
    // Filing by a supervisor is the decision: no proposal waits for one.
    expect(await phone.page.getByRole('form', { name: 'Decide on this proposal' }).count()).toBe(0)
    await phone.page.getByRole('list', { name: 'Timeline' }).getByText('Filed by hand by Tui Marsden').waitFor()
    await screenshot(phone.page, 'incident-filing-phone-record')
    const incidentPath = new URL(phone.page.url()).pathname
    await phone.context.close()

    const desk = await s.newPage(DESKTOP)
    await s.signIn(desk.page, supervisor.email)
    await desk.page.getByRole('link', { name: 'Incidents' }).click()
    const item = desk.page
      .getByRole('list', { name: 'Incidents' })
      .getByRole('listitem')
      .filter({ hasText: `Escape from ${tank.code}` })
    await item.waitFor()
    expect(await item.textContent()).toMatch(new RegExp(`${tank.code} · 2 affected · filed by hand.*Tell the welfare officer: 23 h \\d+ min left`))
    await screenshot(desk.page, 'incident-filing-desktop-list')
    await item.getByRole('link').click()
    await desk.page.waitForURL(`**${incidentPath}`)
    await desk.page.getByText('2 affected · 0 dead').waitFor()
    await screenshot(desk.page, 'incident-filing-desktop-record')
    await desk.context.close()
  }, 120_000)
})
