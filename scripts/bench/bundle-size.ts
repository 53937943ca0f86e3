import { readdirSync, readFileSync } from 'node:fs'
import path from 'node:path'
import { gzipSync } from 'node:zlib'
import { CommandError, runCommand } from './run-command'
import { kb, log, seconds, type Row } from './stats'

interface Chunk {
  file: string
  src?: string
  name?: string
  isEntry?: boolean
  isDynamicEntry?: boolean
  imports?: string[]
}
type Manifest = Record<string, Chunk>

const ROUND_ROUTE = 'src/app/routes/round-page.tsx'
const GOAL_BYTES = 120 * 1024

const BUILD_ATTEMPTS = 8

/**
 * Builds the client into `outDir` with a manifest (vite.config.ts is left as it is). Vite refuses
 * to build while another build of this project runs (e.g. someone's `npm test`), so wait for it.
 */
export async function buildClient(outDir: string): Promise<number> {
  for (let attempt = 1; ; attempt++) {
    const start = performance.now()
    log(`vite build into ${outDir}`)
    try {
      // With the profile on, source maps let it name the functions of the minified build (the .map files are not counted).
      const maps = process.env.ROUNDTIDE_BENCH_PROFILE ? ['--sourcemap'] : []
      await runCommand('npx', ['vite', 'build', '--manifest', ...maps, '--outDir', outDir, '--emptyOutDir', '--logLevel', 'warn'], { timeoutMs: 180_000 })
      return performance.now() - start
    } catch (err) {
      const locked = err instanceof CommandError && err.output.includes('Found another Vite build process')
      if (!locked || attempt === BUILD_ATTEMPTS) throw err
      log(`another vite build is running; trying again in 5 s (${attempt}/${BUILD_ATTEMPTS - 1})`)
      await new Promise((r) => setTimeout(r, 5000))
    }
  }
}

/** Keys of a chunk and everything it imports statically. */
function withStaticImports(manifest: Manifest, key: string, into = new Set<string>()): Set<string> {
  if (into.has(key) || !manifest[key]) return into
  into.add(key)
  for (const dep of manifest[key].imports ?? []) withStaticImports(manifest, dep, into)
  return into
}

/** Measurement 5: gzipped JavaScript the Round route loads first, and each lazy chunk. */
export function measureBundle(outDir: string, buildMs: number, floorBytes: number): Row[] {
  const manifest = JSON.parse(readFileSync(path.join(outDir, '.vite', 'manifest.json'), 'utf8')) as Manifest
  const gz = new Map<string, number>()
  const gzipOf = (key: string) => {
    const file = manifest[key].file
    if (!gz.has(file)) gz.set(file, file.endsWith('.js') ? gzipSync(readFileSync(path.join(outDir, file))).length : 0)
    return gz.get(file)!
  }
  const entry = Object.keys(manifest).find((k) => manifest[k].isEntry)
  if (!entry) throw new Error('the manifest has no entry')
  if (!manifest[ROUND_ROUTE]) throw new Error(`the manifest has no ${ROUND_ROUTE}`)
  const initial = withStaticImports(manifest, entry)
  const round = withStaticImports(manifest, ROUND_ROUTE, new Set(initial))
  const sum = (keys: Iterable<string>) => [...keys].reduce((total, k) => total + gzipOf(k), 0)
  const lazy = Object.keys(manifest)
    .filter((k) => manifest[k].isDynamicEntry)
    .map((k) => ({ name: k.replace(/^src\/app\/routes\//, '').replace(/\.tsx?$/, ''), bytes: gzipOf(k) }))
    .sort((a, b) => b.bytes - a.bytes)
  const first = sum(round)
  return [
    {
      measurement: '5 Round route first-load JS (gzip)',
      result: `${kb(first)} (goal ≤ ${kb(GOAL_BYTES)}: ${first <= GOAL_BYTES ? 'met' : 'NOT met'})`,
      detail: `${round.size} chunks: entry + static imports ${kb(sum(initial))} (${initial.size}), round route + its imports ${kb(first - sum(initial))}; build ${seconds(buildMs)}`,
    },
    {
      measurement: '5 first-load floor: the libraries alone',
      result: kb(floorBytes),
      detail: 'React, React Router (data mode), TanStack Query and zod checking one answer, nothing of Roundtide (scripts/bench/stack-floor)',
    },
    {
      measurement: '5 Round first load / floor',
      result: `${(first / floorBytes).toFixed(2)}×`,
      detail: `Roundtide's own code and the Round's imports add ${kb(first - floorBytes)} to the floor`,
    },
    ...lazy.map((c) => ({ measurement: `5 lazy chunk ${c.name}`, result: kb(c.bytes), detail: 'gzip, the chunk alone' })),
  ]
}

/** The floor beside measurement 5: the shared libraries alone (scripts/bench/stack-floor), gzip. */
export async function measureStackFloor(outDir: string): Promise<number> {
  await runCommand(
    'npx',
    [
      'vite',
      'build',
      'scripts/bench/stack-floor',
      '--config',
      'scripts/bench/stack-floor/vite.config.ts',
      '--outDir',
      outDir,
      '--emptyOutDir',
      '--logLevel',
      'warn',
    ],
    { timeoutMs: 180_000 },
  )
  const assets = path.join(outDir, 'assets')
  return readdirSync(assets)
    .filter((f) => f.endsWith('.js'))
    .reduce((total, f) => total + gzipSync(readFileSync(path.join(assets, f))).length, 0)
}
