import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { db } from '#server/db/data-source'
import { PushSubscriptionEntity } from '#server/modules/escalation/push-subscription.entity'
import { PersonEntity } from '#server/modules/people/person.entity'
import { PHONE, screenshot, startBrowserSession, type BrowserSession } from '#tests/support/browser'
import { launchPushProfile, startGcmStandIn, type GcmStandIn } from '#tests/support/gcm-stand-in'
import { ensureFacilityAndParameters } from '#tests/support/facility-fixtures'
import { openPushSettings } from '#tests/support/push-settings'

let s: BrowserSession
let gcm: GcmStandIn
beforeAll(async () => {
  s = await startBrowserSession()
  await ensureFacilityAndParameters()
  gcm = await startGcmStandIn()
})
afterAll(async () => {
  await gcm?.close()
  await s?.close()
})

/** A person who accepts push alerts, signed in on the settings page of a browser whose service worker controls the page. */
async function settingsPageOf(name: string) {
  const person = await s.createPerson('technician', { name })
  await db()
    .getRepository(PersonEntity)
    .update(person.id, { channels: ['push'] })
  const browser = await launchPushProfile(gcm, { baseURL: s.url, viewport: PHONE })
  const page = await browser.context.newPage()
  await s.signIn(page, person.email)
  await openPushSettings(page)
  return { person, page, browser }
}

const subscriptionsOf = (personId: number) => db().getRepository(PushSubscriptionEntity).findBy({ personId })

describe('"Send alerts to this device" with the browser subscribing for real', () => {
  test('Chromium registers at the (stand-in) push service with the server key, and the subscription it made, with its own keys, is saved for the person', async () => {
    const { person, page, browser } = await settingsPageOf('Tamsin Reedy')
    await page.getByRole('button', { name: 'Send alerts to this device' }).click()
    await page.getByText('This device receives your alerts.').waitFor()

    const [registration] = gcm.webPushRegistrations()
    expect(registration.form.sender).toBe(s.config.push.vapid!.publicKey)
    expect(registration.form['X-subtype']).toContain(`wp:${new URL(s.url).origin}`)
    expect(registration.authorization).toBe('AidLogin 4200000000001:7300000000002')
    const [saved] = await subscriptionsOf(person.id)
    // The endpoint is the token the stand-in gave, on the host Chromium builds it with.
    const token = /\/fcm\/send\/(.+)$/.exec(saved.endpoint)?.[1]
    expect(token).toMatch(/^stand-in-\d+:APA91b/)
    expect(Buffer.from(saved.p256dh, 'base64url')).toHaveLength(65)
    expect(Buffer.from(saved.p256dh, 'base64url')[0]).toBe(4)
    expect(Buffer.from(saved.auth, 'base64url')).toHaveLength(16)
    await screenshot(page, 'push-subscribed-phone')
    await browser.close()
  })

  test('when the push service refuses the registration, the page says so plainly and nothing is saved', async () => {
    gcm.refuseRegistrations(true)
    try {
      const { person, page, browser } = await settingsPageOf('Corwen Ashby')
      await page.getByRole('button', { name: 'Send alerts to this device' }).click()
      const message = page.getByRole('alert').filter({ hasText: 'This browser could not register this device with its push service' })
      await message.waitFor()
      expect(await message.textContent()).toContain('nothing was saved')
      // Chromium's own words for the refusal, kept at the end for whoever troubleshoots.
      expect(await message.textContent()).toContain('(Browser said: Registration failed - push service error)')
      await page.getByText('This device does not receive alerts.').waitFor()
      expect(await subscriptionsOf(person.id)).toEqual([])
      expect(await page.evaluate(async () => (await (await navigator.serviceWorker.ready).pushManager.getSubscription()) === null)).toBe(true)
      await message.scrollIntoViewIfNeeded()
      await screenshot(page, 'push-subscribe-refused-phone')
      await browser.close()
    } finally {
      gcm.refuseRegistrations(false)
    }
  })
})
