import { copyFileSync, readFileSync, writeFileSync } from 'node:fs'
import path from 'node:path'
import { runCommand } from './run-command'
import { log, ms, seconds, type Row } from './stats'

interface LighthouseReport {
  categories: Record<string, { score: number | null }>
  audits: Record<string, { id: string; numericValue?: number; details?: { type?: string; overallSavingsMs?: number } }>
}

const PERFORMANCE_GOAL = 95

/** Measurement 6: Lighthouse (default mobile settings) on a signed-in page; no performance score is a failure. */
export async function measureLighthouse(
  url: string,
  page: { name: string; path: string; slug: string },
  cookie: string,
  workDir: string,
  client: string,
): Promise<Row> {
  const headers = path.join(workDir, `lighthouse-headers-${page.slug}.json`)
  const report = path.join(workDir, `lighthouse-${page.slug}.json`)
  writeFileSync(headers, JSON.stringify({ Cookie: cookie }))
  const start = performance.now()
  log(`lighthouse: ${page.name}`)
  const args = [
    'lighthouse',
    `${url}${page.path}`,
    '--output=json',
    `--output-path=${report}`,
    '--quiet',
    '--only-categories=performance,accessibility',
    `--extra-headers=${headers}`,
    '--chrome-flags=--headless=new --no-sandbox --disable-gpu --disable-background-networking',
  ]
  const env = { ...process.env, CHROME_PATH: process.env.CHROME_PATH ?? '/usr/bin/chromium' }
  // On a busy machine Lighthouse sometimes loses its trace (NO_NAVSTART) and asks to be run again: once more.
  await runCommand('npx', args, { env, timeoutMs: 150_000 }).catch((err: Error) => {
    log(`lighthouse failed (${err.message}); running it once more`)
    return runCommand('npx', args, { env, timeoutMs: 150_000 })
  })
  let lh = JSON.parse(readFileSync(report, 'utf8')) as LighthouseReport
  if (lh.categories.performance?.score == null) {
    log(`lighthouse gave ${page.name} no performance score; running it once more`)
    await runCommand('npx', args, { env, timeoutMs: 150_000 })
    lh = JSON.parse(readFileSync(report, 'utf8')) as LighthouseReport
  }
  // ROUNDTIDE_BENCH_LIGHTHOUSE_DIR=<dir> keeps each report (the work folder is removed at the end) to read where the time goes.
  if (process.env.ROUNDTIDE_BENCH_LIGHTHOUSE_DIR) copyFileSync(report, path.join(process.env.ROUNDTIDE_BENCH_LIGHTHOUSE_DIR, `lighthouse-${page.slug}.json`))
  const performanceScore = lh.categories.performance?.score
  if (performanceScore == null) {
    const lcp = lh.audits['largest-contentful-paint']?.numericValue
    throw new Error(
      `Lighthouse returned NO performance score for ${page.name} twice (LCP ${lcp === undefined ? 'missing' : ms(lcp)}): the page was not measured`,
    )
  }
  const score = (key: string) => {
    const s = lh.categories[key]?.score
    return s === null || s === undefined ? 'n/a' : String(Math.round(s * 100))
  }
  const metric = (key: string) => {
    const v = lh.audits[key]?.numericValue
    return v === undefined ? 'n/a' : ms(v)
  }
  const savings = Object.values(lh.audits)
    .filter((a) => a.details?.type === 'opportunity' && (a.details.overallSavingsMs ?? 0) > 0)
    .sort((a, b) => b.details!.overallSavingsMs! - a.details!.overallSavingsMs!)
    .slice(0, 3)
    .map((a) => `${a.id} ${ms(a.details!.overallSavingsMs!)}`)
  return {
    measurement: `6 Lighthouse ${page.name} (mobile)`,
    result: `performance ${score('performance')} (goal ≥ ${PERFORMANCE_GOAL}: ${Math.round(performanceScore * 100) >= PERFORMANCE_GOAL ? 'met' : 'NOT met'}), accessibility ${score('accessibility')}`,
    detail: `FCP ${metric('first-contentful-paint')}, LCP ${metric('largest-contentful-paint')}, TBT ${metric('total-blocking-time')}, CLS ${lh.audits['cumulative-layout-shift']?.numericValue?.toFixed(3) ?? 'n/a'}; savings: ${savings.join(', ') || 'none listed'}; ${client}; run ${seconds(performance.now() - start)}`,
  }
}
