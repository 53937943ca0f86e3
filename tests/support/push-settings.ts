import type { Page } from 'playwright-core'

/**
 * Opens the settings page as the installed app is on every later start: the service worker is
 * installed and controls the page, and this device has no push subscription yet.
 */
export async function openPushSettings(page: Page) {
  await page.goto('/settings')
  await page.getByRole('heading', { name: 'Send alerts to this device' }).waitFor()
  await page.evaluate(() => navigator.serviceWorker.ready.then(() => true))
  await page.reload()
  await page.waitForFunction(() => navigator.serviceWorker.controller !== null)
  await page.getByText('This device does not receive alerts.').waitFor()
}
