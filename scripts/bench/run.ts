// `npm run bench`: builds a large synthetic facility in a throwaway database and prints one
// table of figures (see DEVELOPERS.md, "Benchmark figures"). Not part of `npm test`.
import { existsSync, mkdtempSync, rmSync } from 'node:fs'
import os from 'node:os'
import path from 'node:path'
import { DateTime } from 'luxon'
import type { DataSource } from 'typeorm'
import { createBenchDatabase, dropBenchDatabase } from './bench-db'
import { measureBoardDrag } from './board-drag'
import { measureBoard } from './board-latency'
import { buildClient, measureBundle, measureStackFloor } from './bundle-size'
import { measureCompletions } from './completion-load'
import { measureLighthouse } from './lighthouse-scores'
import { profilePage } from './page-profile'
import { measureMaterialise } from './materialise-step'
import { measureRoundJourney } from './round-journey'
import { measureRuleChecks } from './rule-checks'
import { signInCookie, startBenchServer, type BenchServer } from './server-handle'
import { measureSocketFanout } from './socket-fanout'
import { formatTable, log, reason, seconds, type Row } from './stats'
import { arrangeMorningRound, buildSyntheticFacility, type BenchFacility } from './synthetic-facility'

const started = performance.now()
const cpus = os.cpus()
const rows: Row[] = [
  {
    measurement: '0 machine',
    result: `${cpus.length} cores`,
    detail: `${cpus[0]?.model ?? 'unknown cpu'}, ${Math.round(os.totalmem() / 2 ** 30)} GB, node ${process.version}; load average at start ${os.loadavg()[0].toFixed(2)}`,
  },
]
const workDir = mkdtempSync(path.join(os.tmpdir(), 'roundtide-bench-'))
const outDir = path.join(workDir, 'client')

let ds: DataSource | undefined
let server: BenchServer | undefined
let cleaning: Promise<void> | undefined
function cleanUp() {
  cleaning ??= (async () => {
    await server?.stop().catch((err) => log(`stopping the server failed: ${reason(err)}`))
    await dropBenchDatabase(ds).catch((err) => log(`dropping the bench database failed: ${reason(err)}`))
    rmSync(workDir, { recursive: true, force: true })
    log('cleaned up: server stopped, bench database dropped')
  })()
  return cleaning
}
for (const signal of ['SIGINT', 'SIGTERM'] as const) {
  process.on(signal, () => void cleanUp().finally(() => process.exit(130)))
}
// A last guard for the 10-minute budget: every step has its own timeouts, this catches the rest.
setTimeout(() => {
  log('the bench ran over 11 minutes; stopping')
  void cleanUp().finally(() => process.exit(1))
}, 11 * 60_000).unref()

function need<T>(value: T | undefined | null, what: string): T {
  if (value === undefined || value === null) throw new Error(`skipped: ${what} is not available`)
  return value
}

// ROUNDTIDE_BENCH_ONLY="2,6" runs only those measurements (setup and materialising always run), for quick checks.
const only = process.env.ROUNDTIDE_BENCH_ONLY?.split(',')
  .map((x) => x.trim())
  .filter(Boolean)
const wanted = (label: string) => !only || label.startsWith('setup') || label.startsWith('1 ') || only.some((n) => label.startsWith(`${n} `))

async function step(label: string, fn: () => Promise<Row | Row[]> | Row | Row[]) {
  if (!wanted(label)) return
  const t = performance.now()
  log(`${label}…`)
  try {
    const result = await fn()
    rows.push(...(Array.isArray(result) ? result : [result]))
  } catch (err) {
    rows.push({ measurement: label, result: 'failed', detail: `failed: ${reason(err)}` })
    log(`${label} failed: ${err instanceof Error ? (err.stack ?? err.message) : String(err)}`)
  }
  log(`${label} took ${seconds(performance.now() - t)}`)
}

const tasksOn = async (date: string) =>
  Number(((await need(ds, 'the database').query('SELECT COUNT(*) AS n FROM tasks WHERE localDate = ?', [date])) as Array<{ n: number | string }>)[0].n)

let facility: BenchFacility | undefined
let roundTaskIds: number[] = []
let clientDir: string | null = null
const cookies: { supervisor?: string; technician?: string } = {}
const day = (offset: number) => DateTime.now().setZone(need(facility, 'the facility').zone).plus({ days: offset }).toISODate()!

try {
  await step('setup: bench database and facility', async () => {
    ds = await createBenchDatabase()
    facility = await buildSyntheticFacility()
    return []
  })
  await step('1 materialise', () => measureMaterialise(need(facility, 'the facility').zone))
  await step('setup: morning round', async () => {
    roundTaskIds = await arrangeMorningRound(need(facility, 'the facility'))
    return []
  })
  await step('5 front end', async () => {
    const buildMs = await buildClient(outDir)
    clientDir = outDir
    return measureBundle(outDir, buildMs, await measureStackFloor(path.join(workDir, 'stack-floor')))
  })
  await step('setup: server', async () => {
    server = await startBenchServer(clientDir ?? (existsSync('dist/index.html') ? path.resolve('dist') : null))
    cookies.supervisor = await signInCookie(server.url, need(facility, 'the facility').supervisor.email)
    cookies.technician = await signInCookie(server.url, facility!.roundTechnician.email)
    return []
  })
  const url = () => need(server, 'the server').url
  await step('2 board', () => measureBoard(url(), need(cookies.supervisor, 'a signed-in supervisor'), day(1)))
  await step('2 board drag', async () => measureBoardDrag(url(), need(cookies.supervisor, 'a signed-in supervisor'), day(1), await tasksOn(day(1))))
  await step('3 completions', () => measureCompletions(url(), need(cookies.supervisor, 'a signed-in supervisor'), day(2), day(5), facility!.supervisor.id))
  await step('4 socket fan-out', () => measureSocketFanout(url(), need(cookies.supervisor, 'a signed-in supervisor'), day(3)))
  const served = () => (clientDir ? 'fresh build' : 'dist/ (the fresh build failed)')
  await step('6 lighthouse Round', () =>
    measureLighthouse(url(), { name: 'Round page', path: '/round', slug: 'round' }, need(cookies.technician, 'a signed-in technician'), workDir, served()),
  )
  await step('6 lighthouse board', () =>
    measureLighthouse(
      url(),
      { name: `board (${day(1)}, full day)`, path: `/board?date=${day(1)}`, slug: 'board' },
      need(cookies.supervisor, 'a signed-in supervisor'),
      workDir,
      served(),
    ),
  )
  await step('7 morning round', () =>
    measureRoundJourney(url(), need(cookies.technician, 'a signed-in technician'), need(roundTaskIds.length || null, 'the morning round')),
  )
  // Diagnostic only: ROUNDTIDE_BENCH_PROFILE=1 writes where the Round's main thread spends its first seconds.
  // ROUNDTIDE_BENCH_PROFILE=board profiles the full day's board as well.
  if (process.env.ROUNDTIDE_BENCH_PROFILE)
    await step('10 profile Round', () =>
      profilePage(url(), '/round', need(cookies.technician, 'a signed-in technician'), clientDir, process.env.ROUNDTIDE_BENCH_LIGHTHOUSE_DIR),
    )
  if (process.env.ROUNDTIDE_BENCH_PROFILE === 'board')
    await step('10 profile board', () =>
      profilePage(url(), `/board?date=${day(1)}`, need(cookies.supervisor, 'a signed-in supervisor'), clientDir, process.env.ROUNDTIDE_BENCH_LIGHTHOUSE_DIR),
    )
  await step('9 rule checks', () => measureRuleChecks(need(facility, 'the facility').zone))
} finally {
  await cleanUp()
}

rows.push({
  measurement: '8 total bench time',
  result: seconds(performance.now() - started),
  detail: `setup, all measurements and clean-up; load average at end ${os.loadavg()[0].toFixed(2)}`,
})
const order = (r: Row) => (r.measurement.startsWith('setup') ? 0.5 : Number(/^\d+/.exec(r.measurement)?.[0] ?? 99))
const table = rows.filter((r) => !r.measurement.startsWith('setup') || r.result === 'failed').sort((a, b) => order(a) - order(b))
console.log(formatTable(table))
const failed = table.filter((r) => r.result === 'failed')
if (failed.length) console.error(`\nBENCH FAILED: ${failed.map((r) => `${r.measurement}: ${r.detail}`).join('; ')}`)
process.exit(failed.length ? 1 : 0)
