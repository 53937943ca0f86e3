import { chromium, type Browser, type BrowserContext, type BrowserContextOptions, type Page } from 'playwright-core'
import path from 'node:path'
import { setDataSource } from '#server/db/data-source'
import { startServer } from '#server/start-server'
import { createPerson } from '#server/modules/people/people.service'
import { buildPersonInput, TEST_PASSWORD } from '#seed/factories'
import type { Role } from '#shared/schemas/person'
import { createOwnDatabase, dropOwnDatabase } from './own-database'
import { ensureFacilityAndParameters } from './facility-fixtures'
import { testConfig } from './test-app'

export const PHONE = { width: 390, height: 844 }
export const DESKTOP = { width: 1366, height: 900 }

/** The built client and API on a free port, and Debian's chromium driven by playwright-core. */
export async function startBrowserSession() {
  const database = await createOwnDatabase(testConfig().db, 'e2e')
  const config = testConfig({ port: 0 })
  const server = await startServer({ ...config, db: { ...config.db, database } }, { clientDir: path.resolve('dist') })
  const browser: Browser = await chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    headless: true,
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
      '--no-first-run',
      '--disable-quic',
    ],
  })

  /** A context on the app (service workers blocked unless asked for), whose close cannot hang a journey. */
  async function newContext(options: BrowserContextOptions = {}): Promise<BrowserContext> {
    return boundedClose(await browser.newContext({ viewport: DESKTOP, baseURL: server.url, serviceWorkers: 'block', ...options }))
  }

  async function newPage(viewport = DESKTOP): Promise<{ context: BrowserContext; page: Page }> {
    const context = await newContext({ viewport })
    const page = await context.newPage()
    return { context, page }
  }

  async function signIn(page: Page, email: string, password = TEST_PASSWORD) {
    await page.goto('/sign-in')
    await submitSignIn(page, email, password)
    await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'))
  }

  return {
    url: server.url,
    config: server.config,
    database,
    browser,
    newContext,
    newPage,
    signIn,
    createPerson: (role: Role, extra: Parameters<typeof buildPersonInput>[0] = {}) => createPerson(buildPersonInput({ role, ...extra })),
    async close() {
      await browser.close()
      await server.stop()
      setDataSource(undefined as never)
      await dropOwnDatabase(testConfig().db, database)
    },
  }
}

export type BrowserSession = Awaited<ReturnType<typeof startBrowserSession>>

/** Fills and sends the sign-in form already on the page (keeping whatever `redirectTo` it has). */
export async function submitSignIn(page: Page, email: string, password = TEST_PASSWORD) {
  await page.getByLabel('E-mail').fill(email)
  await page.getByLabel('Password').fill(password)
  await page.getByRole('button', { name: 'Sign in' }).click()
}

const CLOSE_WAIT_MS = 10_000

/**
 * Chromium has once taken 57 s to dispose of a context closed while its page was still loading
 * (record 16k), failing a journey that had already passed. What a journey checks is done by then:
 * after 10 s the close is left to finish on its own (the browser goes at the end of the file).
 */
function boundedClose(context: BrowserContext): BrowserContext {
  const close = context.close.bind(context)
  context.close = async (options) => {
    let timer: NodeJS.Timeout | undefined
    const late = new Promise<'late'>((resolve) => (timer = setTimeout(() => resolve('late'), CLOSE_WAIT_MS)))
    const closing = close(options).catch(() => undefined)
    if ((await Promise.race([closing, late])) === 'late') console.warn(`browser context still closing after ${CLOSE_WAIT_MS / 1000} s; going on`)
    clearTimeout(timer)
  }
  return context
}

export async function screenshot(page: Page, name: string) {
  await page.screenshot({ path: path.join('test-results', `${name}.png`), fullPage: true })
}

/** A browser session on a facility with its parameters, and the facility's zone: most journeys start here. */
export async function startBrowserOnFacility(): Promise<{ s: BrowserSession; zone: string }> {
  const s = await startBrowserSession()
  return { s, zone: (await ensureFacilityAndParameters()).timeZone }
}
