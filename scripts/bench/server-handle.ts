import { fork, type ChildProcess } from 'node:child_process'
import path from 'node:path'
import { BENCH_PASSWORD } from './synthetic-facility'
import { log } from './stats'

export interface BenchServer {
  url: string
  stop: () => Promise<void>
}

const exited = (child: ChildProcess, ms: number) =>
  new Promise<boolean>((resolve) => {
    if (child.exitCode !== null || child.signalCode !== null) return resolve(true)
    const timer = setTimeout(() => resolve(false), ms)
    child.once('exit', () => {
      clearTimeout(timer)
      resolve(true)
    })
  })

/** Starts scripts/bench/serve.ts in a child process and waits for its URL. */
export async function startBenchServer(clientDir: string | null): Promise<BenchServer> {
  const child = fork(path.resolve('scripts/bench/serve.ts'), clientDir ? [clientDir] : [], {
    // ROUNDTIDE_BENCH_CPU_PROF=<dir>: the server writes a V8 CPU profile there when it stops.
    execArgv: ['--import', 'tsx', ...(process.env.ROUNDTIDE_BENCH_CPU_PROF ? ['--cpu-prof', `--cpu-prof-dir=${process.env.ROUNDTIDE_BENCH_CPU_PROF}`] : [])],
    // The server's logs go to our stderr, keeping stdout for the table.
    stdio: ['ignore', 2, 2, 'ipc'],
  })
  const stop = async () => {
    if (child.exitCode !== null || child.signalCode !== null) return
    if (child.connected) child.send('stop')
    if (!(await exited(child, 15_000))) {
      log(`server ${child.pid} did not stop in 15 s; killing it`)
      child.kill('SIGKILL')
      await exited(child, 5_000)
    }
  }
  const url = await new Promise<string>((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error('the server did not start in 60 s')), 60_000)
    child.once('message', (m) => {
      clearTimeout(timer)
      resolve((m as { url: string }).url)
    })
    child.once('exit', (code) => {
      clearTimeout(timer)
      reject(new Error(`the server exited with code ${code} before it was ready`))
    })
  }).catch(async (err: Error) => {
    await stop()
    throw err
  })
  log(`server ${child.pid} at ${url}${clientDir ? ` serving ${clientDir}` : ''}`)
  return { url, stop }
}

/** Signs in over HTTP and returns the session cookie ("roundtide.sid=…"). */
export async function signInCookie(url: string, email: string): Promise<string> {
  const res = await fetch(`${url}/api/session`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email, password: BENCH_PASSWORD }),
  })
  if (!res.ok) throw new Error(`sign-in as ${email} answered ${res.status}`)
  const cookie = res.headers.getSetCookie().find((c) => c.startsWith('roundtide.sid='))
  if (!cookie) throw new Error('sign-in set no roundtide.sid cookie')
  return cookie.split(';')[0]
}
