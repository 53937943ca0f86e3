import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import type { Page } from 'playwright-core'
import { DESKTOP, PHONE, screenshot, startBrowserSession, submitSignIn, type BrowserSession } from '#tests/support/browser'

let s: BrowserSession
beforeAll(async () => {
  s = await startBrowserSession()
})
afterAll(() => s?.close())

/** The pages the browser loads from here on (a soft navigation loads none). */
function documentsLoaded(page: Page): string[] {
  const documents: string[] = []
  page.on('request', (request) => void (request.isNavigationRequest() && documents.push(request.url())))
  return documents
}

describe('signing in and out', () => {
  test('a technician on a phone signs in, sees the round navigation without People, and signs out', async () => {
    const tech = await s.createPerson('technician')
    const { page, context } = await s.newPage(PHONE)
    await s.signIn(page, tech.email)
    await expect.poll(() => page.url()).toContain('/round')
    const nav = page.getByRole('navigation', { name: 'Main' }).filter({ visible: true })
    await nav.getByRole('link', { name: 'Round' }).waitFor()
    expect(await nav.getByRole('link', { name: 'Board' }).isVisible()).toBe(true)
    await page.getByRole('button', { name: 'More' }).click()
    expect(await page.getByRole('link', { name: 'People' }).count()).toBe(0)
    await screenshot(page, 'technician-phone-more')
    await page.getByRole('button', { name: 'Sign out' }).click()
    await page.waitForURL('**/sign-in')
    const documents = documentsLoaded(page)
    await page.goto('/round')
    await page.waitForURL('**/sign-in?redirectTo=%2Fround')
    await page.getByRole('button', { name: 'Sign in' }).waitFor()
    // The round's early request and the session check both meet the refusal; the page still loads once.
    expect(documents).toHaveLength(1)
    await context.close()
  })

  test('when the session ends elsewhere, the open round goes to sign in at once and comes back after, without reloading', async () => {
    const tech = await s.createPerson('technician')
    const { page, context } = await s.newPage(PHONE)
    await s.signIn(page, tech.email)
    await page.getByRole('navigation', { name: 'Main' }).filter({ visible: true }).getByRole('link', { name: 'Round' }).waitFor()
    const documents = documentsLoaded(page)
    // Signing out through the API, as another tab would, leaves this page holding a dead session.
    expect((await page.request.delete('/api/session')).ok()).toBe(true)
    // The server drops the session's live connection, so the page learns without a click.
    await page.waitForURL('**/sign-in?redirectTo=%2Fround')
    await page.getByRole('status').filter({ hasText: 'the page you were opening' }).waitFor()
    await screenshot(page, 'session-ended-phone-sign-in')
    await submitSignIn(page, tech.email)
    await page.waitForURL('**/round')
    expect(documents).toHaveLength(0)
    await context.close()
  })

  test('a manager on a desktop signs in and sees every section including People', async () => {
    const manager = await s.createPerson('manager')
    const { page, context } = await s.newPage(DESKTOP)
    await s.signIn(page, manager.email)
    const nav = page.getByRole('navigation', { name: 'Main' }).filter({ visible: true })
    for (const name of [
      'Round',
      'Board',
      'Calendar',
      'On call',
      'Tanks',
      'Routines',
      'Playbooks',
      'Oxygen',
      'Roster',
      'Reports',
      'Round sheet',
      'People',
      'Outbox',
      'Settings',
    ]) {
      await nav.getByRole('link', { name, exact: true }).waitFor()
    }
    await screenshot(page, 'manager-desktop-home')
    await context.close()
  })

  test('a wrong password shows a clear message and stays on the sign-in page', async () => {
    const tech = await s.createPerson('technician')
    const { page, context } = await s.newPage(PHONE)
    await page.goto('/sign-in')
    await submitSignIn(page, tech.email, 'definitely-wrong')
    await page.getByRole('alert').filter({ hasText: 'do not match' }).waitFor()
    expect(page.url()).toContain('/sign-in')
    await context.close()
  })
})
