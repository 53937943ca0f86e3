import { chromium, type Browser, type Locator, type Page } from 'playwright-core'
import { log, seconds, type Row } from './stats'

const PHONE = { width: 390, height: 844 }
const GOAL = 2

/** Counts what a person does beyond typing the reading's digits. */
function counted(page: Page) {
  const c = { taps: 0, keys: 0, digits: 0 }
  return {
    c,
    tap: async (target: Locator) => {
      c.taps++
      await target.click()
    },
    press: async (key: string) => {
      c.keys++
      await page.keyboard.press(key)
    },
    type: async (text: string) => {
      for (const ch of text) {
        if (/[0-9.]/.test(ch)) c.digits++
        else c.keys++
        await page.keyboard.press(ch)
      }
    },
  }
}

/** True once a fresh reading field has the focus (Done advanced to the next task by itself). */
const freshFieldFocused = (page: Page, timeout: number) =>
  page
    .waitForFunction(
      () => {
        const el = document.activeElement as HTMLInputElement | null
        return !!el && el.inputMode === 'decimal' && el.value === ''
      },
      null,
      { timeout },
    )
    .then(
      () => true,
      () => false,
    )

/** Measurement 7: a technician's 24-tank round with DO and temperature, on a phone-sized page. */
export async function measureRoundJourney(url: string, cookie: string, taskCount: number): Promise<Row> {
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
  try {
    const context = await browser.newContext({ viewport: PHONE, baseURL: url, serviceWorkers: 'block', hasTouch: true, isMobile: true })
    const [name, value] = [cookie.slice(0, cookie.indexOf('=')), cookie.slice(cookie.indexOf('=') + 1)]
    await context.addCookies([{ name, value, url }])
    const page = await context.newPage()
    await page.goto('/round')
    await page.getByText(`0 of ${taskCount} done`).waitFor({ timeout: 30_000 })
    await page.getByRole('status', { name: 'Connection: Live' }).waitFor({ timeout: 15_000 })
    const rows = page.getByRole('button', { name: /^\d\d:\d\d Morning water check / })
    const act = counted(page)
    const start = performance.now()
    let openedByHand = 0
    for (let i = 0; i < taskCount; i++) {
      // The round opens the first task due by itself, and Done opens the next; a tap only when neither did.
      if (!(await freshFieldFocused(page, 5000))) {
        openedByHand++
        await act.tap(rows.nth(i))
        await freshFieldFocused(page, 5000)
      }
      const doValue = (6 + (i % 10) / 5).toFixed(1)
      const tempValue = (27 + (i % 10) / 5).toFixed(1)
      await act.type(doValue)
      await act.press('Enter')
      await act.type(tempValue)
      if ((await page.getByLabel('Dissolved oxygen').inputValue()) !== doValue || (await page.getByLabel('Temperature').inputValue()) !== tempValue) {
        throw new Error(`task ${i + 1}: the readings did not land in their fields`)
      }
      await act.tap(page.getByRole('button', { name: 'Done', exact: true }))
      await page.getByText(`${i + 1} of ${taskCount} done`).waitFor({ timeout: 15_000 })
      if (i % 6 === 5) log(`round: ${i + 1}/${taskCount} tasks done`)
    }
    const wall = performance.now() - start
    const beyond = (act.c.taps + act.c.keys) / taskCount
    return {
      measurement: `7 morning round, ${taskCount} tanks (phone)`,
      result: `${beyond.toFixed(2)} interactions per task beyond digits (goal ≤ ${GOAL}: ${beyond <= GOAL ? 'met' : 'not met'})`,
      detail: `${act.c.taps} taps + ${act.c.keys} other keys (Enter to the next field), ${act.c.digits} digits; ${openedByHand} task(s) opened by tap, ${taskCount - openedByHand} by auto-advance; ${seconds(wall)} wall (${seconds(wall / taskCount)} per task, scripted)`,
    }
  } finally {
    await browser.close()
  }
}
