import { writeFileSync } from 'node:fs'
import path from 'node:path'
import { chromium, type Browser, type Page } from 'playwright-core'
import { startCpuSampling } from './page-profile'
import { log, ms, percentile, type Row } from './stats'

const DESKTOP = { width: 1440, height: 900 }
const FRAME_GOAL_MS = 50
const DRAG_STEPS = 60

// Plain strings, so the page runs exactly this (tsx would wrap functions in helpers the page lacks).
const START_FRAME_CLOCK = `(() => {
  window.__frames = []
  window.__framesOn = true
  let last = performance.now()
  const tick = (now) => {
    window.__frames.push(now - last)
    last = now
    if (window.__framesOn) requestAnimationFrame(tick)
  }
  requestAnimationFrame(tick)
})()`
const STOP_FRAME_CLOCK = '(() => { window.__framesOn = false; return window.__frames.slice(1) })()'

/** Records the time between animation frames until stopped; the page's own clock. */
const startFrameClock = (page: Page) => page.evaluate(START_FRAME_CLOCK)
const stopFrameClock = (page: Page) => page.evaluate<number[]>(STOP_FRAME_CLOCK)

/**
 * ROUNDTIDE_BENCH_DRAG_PROFILE=<dir>: records the drag as a Chrome trace (board-drag-trace.json, for
 * chrome://tracing or the Performance panel) and a CDP CPU profile (board-drag.cpuprofile), to see
 * where the frames go. Profiling slows the page, so a run with it says nothing about the goal.
 */
async function startDragProfile(browser: Browser, page: Page) {
  const dir = process.env.ROUNDTIDE_BENCH_DRAG_PROFILE
  if (!dir) return async (_frames: number[]) => {}
  await browser.startTracing(page, {
    path: path.join(dir, 'board-drag-trace.json'),
    categories: ['devtools.timeline', 'disabled-by-default-devtools.timeline', 'blink.user_timing'],
  })
  const stopSampling = await startCpuSampling(await page.context().newCDPSession(page))
  return async (frames: number[]) => {
    writeFileSync(path.join(dir, 'board-drag-frames.json'), JSON.stringify(frames))
    const profile = await stopSampling()
    writeFileSync(path.join(dir, 'board-drag.cpuprofile'), JSON.stringify(profile))
    await browser.stopTracing()
    log(`board drag: profile and trace written to ${dir}`)
  }
}

/**
 * Measurement 2 (browser): a supervisor opens a full day's board and drags a card by mouse from
 * one person's column to Unassigned; frame times are what the page's animation frames saw.
 */
export async function measureBoardDrag(url: string, cookie: string, date: string, expectedTasks: number): Promise<Row[]> {
  const browser: Browser = await chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    headless: true,
    args: ['--no-sandbox', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run', '--disable-quic'],
  })
  try {
    const context = await browser.newContext({ viewport: DESKTOP, baseURL: url, serviceWorkers: 'block' })
    const [name, value] = [cookie.slice(0, cookie.indexOf('=')), cookie.slice(cookie.indexOf('=') + 1)]
    await context.addCookies([{ name, value, url }])
    const page = await context.newPage()
    const opened = performance.now()
    await page.goto(`/board?date=${date}`)
    const firstCard = page.locator('section li[data-task-id]').first()
    await firstCard.waitFor({ timeout: 60_000 })
    const shownMs = performance.now() - opened
    const drawn = await page.locator('li[data-task-id]').count()
    const total = await page.getByText(/^\d+ tasks?/).allTextContents()
    const counted = total.reduce((sum, t) => sum + Number(/^(\d+)/.exec(t)?.[1] ?? 0), 0)
    if (counted !== expectedTasks) throw new Error(`the board's column headers count ${counted} tasks, not ${expectedTasks}`)
    // A card in a person's column (the second section), dragged to Unassigned (the first).
    const columns = page.locator('section[aria-labelledby]')
    const source = columns.nth(1).locator('li[data-task-id]').first()
    const taskId = await source.getAttribute('data-task-id')
    const a = (await source.boundingBox())!
    const b = (await columns.nth(0).boundingBox())!
    await page.mouse.move(a.x + a.width / 2, a.y + 16)
    const stopProfile = await startDragProfile(browser, page)
    await startFrameClock(page)
    const dragStart = performance.now()
    await page.mouse.down()
    await page.mouse.move(a.x + a.width / 2 + 12, a.y + 24, { steps: 4 })
    await page.mouse.move(b.x + b.width / 2, b.y + 120, { steps: DRAG_STEPS })
    await page.mouse.up()
    await columns.nth(0).locator(`li[data-task-id="${taskId}"]`).waitFor({ timeout: 15_000 })
    const dropMs = performance.now() - dragStart
    const frames = await stopFrameClock(page)
    await stopProfile(frames)
    if (frames.length < 10) throw new Error(`only ${frames.length} animation frames were seen during the drag`)
    const p95 = percentile(frames, 95)
    log(
      `board drag: ${frames.length} frames, p95 ${ms(p95)}; longest ${[...frames]
        .sort((x, y) => y - x)
        .slice(0, 8)
        .map(Math.round)
        .join(', ')} ms`,
    )
    return [
      {
        measurement: '2 board drag in the browser (full day)',
        result: `frame p95 ${ms(p95)} (goal ≤ ${FRAME_GOAL_MS} ms: ${p95 <= FRAME_GOAL_MS ? 'met' : 'NOT met'})`,
        detail: `${expectedTasks} tasks, ${drawn} cards drawn (windowed); ${frames.length} frames over ${DRAG_STEPS} mouse steps, p50 ${ms(percentile(frames, 50))}, max ${ms(Math.max(...frames))}; board shown ${ms(shownMs)} after navigation; drop to card in its new column ${ms(dropMs)}; ${DESKTOP.width}×${DESKTOP.height}`,
      },
    ]
  } finally {
    await browser.close()
  }
}
