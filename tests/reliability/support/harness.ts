// Shared helpers of the reliability tests: real app processes started as children (so they can
// be killed), the private MariaDB of scripts/reliability.sh (so it can be killed and restarted),
// a Redis server for the two-process test, and a small HTTP client with a hard time limit.
import { spawn, type ChildProcess } from 'node:child_process'
import { existsSync, mkdirSync, readFileSync, readdirSync, readlinkSync, rmSync } from 'node:fs'
import net from 'node:net'
import path from 'node:path'
import { setTimeout as sleep } from 'node:timers/promises'
import type { DataSource } from 'typeorm'
import { createDataSource, setDataSource } from '#server/db/data-source'
import { subscribeModules } from '#server/module-subscriptions'
import { loadConfig } from '#server/lib/config'

export { sleep }

export const DEMO_PASSWORD = process.env.ROUNDTIDE_DEMO_PASSWORD ?? 'tidepool-demo'
export const DEMO = {
  manager: 'maren.holloway@brackenwater.example',
  supervisor: 'tomas.ferreira@brackenwater.example',
  priya: 'priya.nandakumar@brackenwater.example',
  josh: 'josh.kettering@brackenwater.example',
  ana: 'ana.lutui@brackenwater.example',
  sione: 'sione.taufa@brackenwater.example',
  elliot: 'elliot.vance@brackenwater.example',
  ruth: 'ruth.amsel@brackenwater.example',
} as const

/** What the error handler says when the database is away (server/lib/error-handler.ts). */
export const DB_DOWN_MESSAGE = 'The database is not reachable just now. Please try again in a moment.'

/** The private database of this run; refuses to go on against the developer's own. */
export function reliabilityDb() {
  const home = process.env.ROUNDTIDE_DB_HOME
  const port = process.env.ROUNDTIDE_DB_PORT
  const name = process.env.ROUNDTIDE_DB_NAME
  if (process.env.ROUNDTIDE_RELIABILITY !== '1' || !home || !port || !name) {
    throw new Error('Run the reliability tests with `npm run test:reliability` (scripts/reliability.sh gives them a database server of their own).')
  }
  if (path.resolve(home) === path.resolve('.data/mariadb') || port === '3307' || name === 'roundtide' || name.endsWith('_test')) {
    throw new Error(
      `Refusing to run: these tests kill their database server, so it must not be the developer's or the other tests' (${home}, port ${port}, ${name}).`,
    )
  }
  return { home: path.resolve(home), port: Number(port), name, pidFile: path.join(path.resolve(home), 'run', 'mariadbd.pid') }
}

/** The test's own connection to the reliability database, used by the fixtures and for checks. */
export async function openDb(): Promise<DataSource> {
  reliabilityDb()
  const ds = createDataSource(loadConfig().db)
  await ds.initialize()
  setDataSource(ds)
  // The fixtures call the services directly, so this process needs the module hooks the app sets up.
  subscribeModules()
  return ds
}

export async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = net.createServer()
    server.once('error', reject)
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.address() as net.AddressInfo
      server.close(() => resolve(port))
    })
  })
}

export interface Reply {
  status: number
  // eslint-disable-next-line @typescript-eslint/no-explicit-any
  body: any
  ms: number
  /** Set when no HTTP answer came: 'timeout' or the network error. */
  error?: string
}

/** One HTTP request with a hard client-side time limit; never throws. */
export async function call(
  baseUrl: string,
  urlPath: string,
  opts: { method?: string; cookie?: string; body?: unknown; timeoutMs?: number } = {},
): Promise<Reply> {
  const started = performance.now()
  const headers: Record<string, string> = {}
  if (opts.cookie) headers.cookie = opts.cookie
  if (opts.body !== undefined) headers['content-type'] = 'application/json'
  try {
    const res = await fetch(baseUrl + urlPath, {
      method: opts.method ?? 'GET',
      headers,
      body: opts.body === undefined ? undefined : JSON.stringify(opts.body),
      signal: AbortSignal.timeout(opts.timeoutMs ?? 8000),
    })
    const text = await res.text()
    let body: unknown = text
    if ((res.headers.get('content-type') ?? '').includes('json') && text) body = JSON.parse(text)
    return { status: res.status, body, ms: performance.now() - started }
  } catch (err) {
    const e = err as Error
    const error =
      e.name === 'TimeoutError' || e.name === 'AbortError'
        ? 'timeout'
        : `${e.message}${(e.cause as Error | undefined)?.message ? `: ${(e.cause as Error).message}` : ''}`
    return { status: 0, body: null, ms: performance.now() - started, error }
  }
}

/** Signs a demo person in over HTTP and returns the session cookie header. */
export async function signIn(baseUrl: string, email: string, password = DEMO_PASSWORD): Promise<string> {
  const res = await fetch(`${baseUrl}/api/session`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email, password }),
    signal: AbortSignal.timeout(10_000),
  })
  if (res.status !== 200) throw new Error(`Sign-in of ${email} answered ${res.status}: ${await res.text()}`)
  return res.headers
    .getSetCookie()
    .map((c) => c.split(';')[0])
    .join('; ')
}

export async function waitFor<T>(what: string, probe: () => Promise<T | null | undefined | false>, timeoutMs: number, everyMs = 200): Promise<T> {
  const deadline = Date.now() + timeoutMs
  for (;;) {
    const value = await probe().catch(() => null)
    if (value) return value
    if (Date.now() > deadline) throw new Error(`Timed out after ${timeoutMs} ms waiting for ${what}`)
    await sleep(everyMs)
  }
}

// ---------------------------------------------------------------- app processes

const children = new Set<ChildProcess>()
process.once('exit', () => {
  for (const child of children) child.kill('SIGKILL')
})

export interface AppProcess {
  name: string
  url: string
  port: number
  pid: number
  /** Milliseconds from spawn until /api/health answered 200. */
  startMs: number
  alive(): boolean
  /** The last lines the process wrote (for failure messages). */
  output(): string
  /** Sends the signal and waits until the process has exited. */
  kill(signal?: NodeJS.Signals): Promise<void>
}

export interface AppOptions {
  smtpPort: number
  port?: number
  schedulerIntervalMs?: number
  redisUrl?: string
  readyTimeoutMs?: number
  /** Further environment for this process (the text provider's settings, ROUNDTIDE_CRASH_AT of server/lib/crash-point.ts). */
  env?: Record<string, string>
}

/**
 * Starts `server/index.ts` as a child process, as `npm start` would (NODE_ENV=production, TZ=UTC),
 * on the reliability database, and waits until /api/health answers 200. Every process of one test
 * gets the same SMTP port: the first runs the local SMTP server, the others send to it.
 */
export async function startApp(name: string, opts: AppOptions): Promise<AppProcess> {
  reliabilityDb()
  const port = opts.port ?? (await freePort())
  const env: NodeJS.ProcessEnv = {
    ...process.env,
    PORT: String(port),
    HOST: '127.0.0.1',
    TZ: 'UTC',
    NODE_ENV: 'production',
    LOG_LEVEL: process.env.RELIABILITY_APP_LOG_LEVEL ?? 'warn',
    ROUNDTIDE_MAIL_MODE: 'local',
    ROUNDTIDE_SMTP_HOST: '127.0.0.1',
    ROUNDTIDE_SMTP_PORT: String(opts.smtpPort),
    // Each app its own local push service on a free port, so runs beside each other never meet on the fixed one.
    ROUNDTIDE_PUSH_LOCAL_PORT: '0',
    ROUNDTIDE_SCHEDULER_INTERVAL_MS: String(opts.schedulerIntervalMs ?? 30_000),
    ...opts.env,
  }
  delete env.ROUNDTIDE_PUBLIC_URL
  if (opts.redisUrl) env.ROUNDTIDE_REDIS_URL = opts.redisUrl
  else delete env.ROUNDTIDE_REDIS_URL

  const started = performance.now()
  const child = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], { env, stdio: ['ignore', 'pipe', 'pipe'] })
  children.add(child)
  const lines: string[] = []
  const keep = (chunk: Buffer) => {
    for (const line of chunk.toString().split('\n')) {
      if (!line.trim()) continue
      lines.push(line.length > 600 ? `${line.slice(0, 600)}…` : line)
      if (lines.length > 200) lines.shift()
    }
  }
  child.stdout!.on('data', keep)
  child.stderr!.on('data', keep)
  let exit: { code: number | null; signal: NodeJS.Signals | null } | null = null
  const exited = new Promise<void>((resolve) =>
    child.once('exit', (code, signal) => {
      exit = { code, signal }
      children.delete(child)
      resolve()
    }),
  )
  const url = `http://127.0.0.1:${port}`
  const output = () => lines.slice(-40).join('\n')
  const deadline = Date.now() + (opts.readyTimeoutMs ?? 45_000)
  for (;;) {
    if (exit) throw new Error(`${name} exited while starting (${JSON.stringify(exit)}):\n${output()}`)
    const health = await call(url, '/api/health', { timeoutMs: 1000 })
    if (health.status === 200) break
    if (Date.now() > deadline) {
      child.kill('SIGKILL')
      throw new Error(`${name} did not become healthy in time:\n${output()}`)
    }
    await sleep(100)
  }
  return {
    name,
    url,
    port,
    pid: child.pid!,
    startMs: Math.round(performance.now() - started),
    alive: () => exit === null && child.exitCode === null && child.signalCode === null,
    output,
    async kill(signal: NodeJS.Signals = 'SIGTERM') {
      if (exit) return
      child.kill(signal)
      const timer = setTimeout(() => child.kill('SIGKILL'), 10_000)
      await exited
      clearTimeout(timer)
    },
  }
}

// ---------------------------------------------------------------- the database server

const isGone = (pid: number) => {
  try {
    process.kill(pid, 0)
  } catch {
    return true
  }
  return false
}
/** A killed process whose parent has not collected it yet. */
const isZombie = (pid: number) => {
  try {
    return /^\d+ \(.*\) Z/.test(readFileSync(`/proc/${pid}/stat`, 'utf8'))
  } catch {
    return true
  }
}

/** SIGKILLs the reliability mariadbd (pid from its data folder) and waits until it is dead. */
export async function killDatabase(): Promise<{ pid: number; killedAt: number }> {
  const { pidFile } = reliabilityDb()
  const pid = Number(readFileSync(pidFile, 'utf8').trim())
  if (!pid) throw new Error(`No pid in ${pidFile}`)
  process.kill(pid, 'SIGKILL')
  const killedAt = Date.now()
  await waitFor('mariadbd to die', async () => isGone(pid) || isZombie(pid), 10_000, 20)
  // scripts/db.sh sees "running" while the pid still exists; where the machine's init reaps
  // orphans only now and then (some containers), give it a moment, then drop the stale pid file.
  await waitFor('mariadbd to be reaped', async () => isGone(pid), 5000, 50).catch(() => {
    if (existsSync(pidFile) && Number(readFileSync(pidFile, 'utf8').trim()) === pid) rmSync(pidFile)
  })
  return { pid, killedAt }
}

/** `bash scripts/db.sh ensure` with this run's settings; returns how long it took. */
export async function ensureDatabase(): Promise<number> {
  reliabilityDb()
  const started = performance.now()
  await run('bash', ['scripts/db.sh', 'ensure'], 60_000)
  return Math.round(performance.now() - started)
}

function run(command: string, args: string[], timeoutMs: number): Promise<string> {
  return new Promise((resolve, reject) => {
    const child = spawn(command, args, { env: process.env, stdio: ['ignore', 'pipe', 'pipe'] })
    let out = ''
    child.stdout.on('data', (c: Buffer) => (out += c.toString()))
    child.stderr.on('data', (c: Buffer) => (out += c.toString()))
    const timer = setTimeout(() => child.kill('SIGKILL'), timeoutMs)
    child.once('error', reject)
    child.once('exit', (code) => {
      clearTimeout(timer)
      if (code === 0) resolve(out)
      else reject(new Error(`${command} ${args.join(' ')} exited with ${code}:\n${out}`))
    })
  })
}

// ---------------------------------------------------------------- Redis

function redisPing(port: number): Promise<boolean> {
  return new Promise((resolve) => {
    const socket = net.connect(port, '127.0.0.1')
    const done = (ok: boolean) => {
      socket.destroy()
      resolve(ok)
    }
    socket.setTimeout(1000, () => done(false))
    socket.once('error', () => done(false))
    socket.once('connect', () => socket.write('PING\r\n'))
    socket.once('data', (d) => done(d.toString().startsWith('+PONG')))
  })
}

/** Debian's redis-server on loopback, no persistence, daemonised with a pid file in .data/. */
export async function startRedis(port = Number(process.env.ROUNDTIDE_RELIABILITY_REDIS_PORT ?? 6390)) {
  const dir = path.resolve('.data/redis-reliability')
  mkdirSync(dir, { recursive: true })
  const pidFile = path.join(dir, 'redis.pid')
  const stopOld = async () => {
    if (!existsSync(pidFile)) return
    const pid = Number(readFileSync(pidFile, 'utf8').trim())
    const cmdline = pid
      ? (() => {
          try {
            return readFileSync(`/proc/${pid}/cmdline`, 'utf8')
          } catch {
            return ''
          }
        })()
      : ''
    if (pid && !isGone(pid) && cmdline.includes('redis-server')) {
      process.kill(pid, 'SIGTERM')
      await waitFor('redis-server to stop', async () => isGone(pid) || isZombie(pid), 10_000, 50)
    }
    rmSync(pidFile, { force: true })
  }
  await stopOld() // left over from an interrupted run
  if (await redisPing(port)) throw new Error(`Something already answers on 127.0.0.1:${port}; set ROUNDTIDE_RELIABILITY_REDIS_PORT to a free port.`)
  await run(
    'redis-server',
    [
      '--port',
      String(port),
      '--bind',
      '127.0.0.1',
      '--save',
      '',
      '--appendonly',
      'no',
      '--daemonize',
      'yes',
      '--pidfile',
      pidFile,
      '--dir',
      dir,
      '--logfile',
      path.join(dir, 'redis.log'),
    ],
    15_000,
  )
  await waitFor('redis-server to answer PING', () => redisPing(port), 10_000, 50)
  return { url: `redis://127.0.0.1:${port}`, port, stop: stopOld }
}

// ---------------------------------------------------------------- reporting

/** One line per figure under a heading, so the run's output reads as a short summary. */
export function summary(test: string, figures: Record<string, unknown>) {
  const lines = Object.entries(figures).map(([k, v]) => `  ${k}: ${typeof v === 'object' ? JSON.stringify(v) : String(v)}`)
  console.log(`\n[reliability] ${test}\n${lines.join('\n')}\n`)
}

export const percentile = (values: number[], p: number) => {
  if (!values.length) return 0
  const sorted = [...values].sort((a, b) => a - b)
  return Math.round(sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))])
}

// ---------------------------------------------------------------- the scheduler's leader

/**
 * Which of these processes holds the scheduler's GET_LOCK: MariaDB names the holder's connection,
 * the process list gives that connection's client port, and /proc says which process owns it.
 */
export async function schedulerLeader(ds: DataSource, processes: AppProcess[], lockName = 'roundtide_scheduler'): Promise<AppProcess | null> {
  const [row] = (await ds.query('SELECT p.HOST AS host FROM information_schema.PROCESSLIST p WHERE p.ID = IS_USED_LOCK(?)', [lockName])) as Array<{
    host: string
  }>
  const port = Number(row?.host?.split(':').at(-1))
  if (!port) return null
  const hexPort = port.toString(16).toUpperCase().padStart(4, '0')
  const inodes = new Set<string>()
  for (const table of ['/proc/net/tcp', '/proc/net/tcp6']) {
    if (!existsSync(table)) continue
    for (const line of readFileSync(table, 'utf8').split('\n').slice(1)) {
      const cols = line.trim().split(/\s+/)
      if (cols[1]?.endsWith(`:${hexPort}`)) inodes.add(cols[9])
    }
  }
  for (const p of processes) {
    if (!p.alive()) continue
    for (const fd of readdirSync(`/proc/${p.pid}/fd`)) {
      const target = (() => {
        try {
          return readlinkSync(`/proc/${p.pid}/fd/${fd}`)
        } catch {
          return ''
        }
      })()
      const inode = /^socket:\[(\d+)\]$/.exec(target)?.[1]
      if (inode && inodes.has(inode)) return p
    }
  }
  return null
}
