import { existsSync, readFileSync, writeFileSync } from 'node:fs'
import path from 'node:path'
import { chromium, type CDPSession } from 'playwright-core'
import { SourceMapConsumer } from 'source-map-js'
import { log, ms, type Row } from './stats'

// Lighthouse's mobile preset slows the CPU four times; the profile does the same so its figures compare.
const CPU_SLOWDOWN = 4
const PHONE = { width: 412, height: 823 }
const SETTLE_MS = 8000

export interface ProfileNode {
  id: number
  callFrame: { functionName: string; url: string; lineNumber: number; columnNumber: number }
  children?: number[]
}
export interface CpuProfile {
  nodes: ProfileNode[]
  samples: number[]
  timeDeltas: number[]
}

/** Names a frame by the build's source maps when they are there (the bench builds them with the profile on). */
function frameNamer(clientDir: string | null) {
  const maps = new Map<string, SourceMapConsumer | null>()
  return (frame: ProfileNode['callFrame']) => {
    const file = frame.url ? path.basename(frame.url.split('?')[0]) : 'native'
    const mapFile = clientDir && path.join(clientDir, 'assets', `${file}.map`)
    if (mapFile && !maps.has(mapFile)) maps.set(mapFile, existsSync(mapFile) ? new SourceMapConsumer(JSON.parse(readFileSync(mapFile, 'utf8'))) : null)
    const original = mapFile ? maps.get(mapFile)?.originalPositionFor({ line: frame.lineNumber + 1, column: frame.columnNumber }) : undefined
    if (original?.source) {
      // A library's path from its package folder on; ours from src/ or shared/.
      const source = original.source.includes('node_modules/')
        ? original.source.replace(/^.*node_modules\//, '')
        : original.source.replace(/^.*?\/(src|shared)\//, '$1/')
      return `${original.name ?? frame.functionName ?? '(anonymous)'} ${source}:${original.line}`
    }
    return `${frame.functionName || '(anonymous)'} ${file}:${frame.lineNumber + 1}:${frame.columnNumber + 1}`
  }
}

/** Self time per function (name, file and line), biggest first; idle and the profiler's own frames left out. */
function selfTimes(profile: CpuProfile, name: (frame: ProfileNode['callFrame']) => string): Array<{ where: string; ms: number }> {
  const byId = new Map(profile.nodes.map((n) => [n.id, n]))
  const totals = new Map<string, number>()
  profile.samples.forEach((id, i) => {
    const frame = byId.get(id)?.callFrame
    if (!frame || ['(idle)', '(program)', '(root)'].includes(frame.functionName)) return
    const where = name(frame)
    totals.set(where, (totals.get(where) ?? 0) + (profile.timeDeltas[i] ?? 0) / 1000)
  })
  return [...totals].map(([where, t]) => ({ where, ms: t })).sort((a, b) => b.ms - a.ms)
}

/**
 * Blocking time as Lighthouse counts it (each stretch of work beyond 50 ms), from the samples: a
 * run of samples with no idle between them is one task. Idle gaps shorter than a sample merge two
 * tasks, so this errs high.
 */
function blockingTime(profile: CpuProfile): { blockingMs: number; longest: number; longTasks: number } {
  const byId = new Map(profile.nodes.map((n) => [n.id, n]))
  const runs: number[] = []
  let run = 0
  profile.samples.forEach((id, i) => {
    const idle = byId.get(id)?.callFrame.functionName === '(idle)'
    if (idle) {
      if (run > 0) runs.push(run)
      run = 0
    } else run += (profile.timeDeltas[i] ?? 0) / 1000
  })
  if (run > 0) runs.push(run)
  const long = runs.filter((r) => r > 50)
  return { blockingMs: long.reduce((sum, r) => sum + r - 50, 0), longest: Math.max(0, ...runs), longTasks: long.length }
}

/** Self time summed by library (the package under node_modules) or by our own folder. */
function byLibrary(top: Array<{ where: string; ms: number }>): string {
  const sums = new Map<string, number>()
  for (const t of top) {
    const source = t.where.split(' ').at(-1) ?? ''
    const lib = /^(src|shared)\//.test(source)
      ? 'our code'
      : /\.js:\d+:\d+$|^native$/.test(source)
        ? 'browser and unmapped'
        : source.split('/')[0].startsWith('@')
          ? source.split('/').slice(0, 2).join('/')
          : source.split('/')[0]
    sums.set(lib, (sums.get(lib) ?? 0) + t.ms)
  }
  return [...sums]
    .sort((a, b) => b[1] - a[1])
    .slice(0, 6)
    .map(([lib, t]) => `${lib} ${ms(t)}`)
    .join(', ')
}

/** V8's sampling profiler on the page behind `cdp`, every 200 µs; the returned function stops it and gives the profile. */
export async function startCpuSampling(cdp: CDPSession): Promise<() => Promise<CpuProfile>> {
  await cdp.send('Profiler.enable')
  await cdp.send('Profiler.setSamplingInterval', { interval: 200 })
  await cdp.send('Profiler.start')
  return async () => ((await cdp.send('Profiler.stop')) as { profile: CpuProfile }).profile
}

/**
 * Measurement 10 (diagnostic, ROUNDTIDE_BENCH_PROFILE=1): where a page's main thread spends its
 * time in the first seconds on a slowed phone, from V8's sampling profiler. Build the client
 * with source maps (the bench does when the profile is on) to read function names.
 */
export async function profilePage(url: string, pagePath: string, cookie: string, clientDir: string | null, outDir: string | undefined): Promise<Row> {
  const browser = await chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    headless: true,
    args: ['--no-sandbox', '--disable-background-networking', '--disable-component-update', '--no-first-run'],
  })
  try {
    const context = await browser.newContext({ viewport: PHONE, baseURL: url, serviceWorkers: 'block' })
    const [name, value] = [cookie.slice(0, cookie.indexOf('=')), cookie.slice(cookie.indexOf('=') + 1)]
    await context.addCookies([{ name, value, url }])
    const page = await context.newPage()
    const cdp = await context.newCDPSession(page)
    await cdp.send('Emulation.setCPUThrottlingRate', { rate: CPU_SLOWDOWN })
    const stopSampling = await startCpuSampling(cdp)
    await page.goto(pagePath)
    await page.waitForTimeout(SETTLE_MS)
    const profile = await stopSampling()
    if (outDir) writeFileSync(path.join(outDir, `profile${pagePath.replace(/\W+/g, '-')}.cpuprofile`), JSON.stringify(profile))
    const top = selfTimes(profile, frameNamer(clientDir))
    const busy = top.reduce((sum, t) => sum + t.ms, 0)
    const blocking = blockingTime(profile)
    for (const t of top.slice(0, 30)) log(`  ${ms(t.ms).padStart(9)}  ${t.where}`)
    return {
      measurement: `10 profile ${pagePath} (CPU ×${CPU_SLOWDOWN}, first ${SETTLE_MS / 1000} s)`,
      result: `main thread busy ${ms(busy)}, blocking ${ms(blocking.blockingMs)} (${blocking.longTasks} tasks over 50 ms, longest ${ms(blocking.longest)})`,
      detail: `by library: ${byLibrary(top)}; top: ${top
        .slice(0, 4)
        .map((t) => `${t.where} ${ms(t.ms)}`)
        .join('; ')}`,
    }
  } finally {
    await browser.close()
  }
}
