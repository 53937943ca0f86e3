import { io, type Socket } from 'socket.io-client'
import { LIVE_EVENTS, type TasksUpdatedEvent } from '#shared/schemas/live'
import { completionBody, openReadingTaskIds } from './open-tasks'
import { log, ms, summary, type Row } from './stats'

const CLIENTS = 50
const COMPLETIONS = 50

function connect(url: string, cookie: string): Promise<Socket> {
  return new Promise((resolve, reject) => {
    const socket = io(url, { transports: ['websocket'], extraHeaders: { cookie }, reconnection: false, timeout: 10_000 })
    socket.once('connect', () => resolve(socket))
    socket.once('connect_error', (err) => reject(err))
  })
}

/** Measurement 4: from a completion's HTTP response until all 50 signed-in clients have the changed task (tasks:updated). */
export async function measureSocketFanout(url: string, cookie: string, date: string): Promise<Row> {
  const ids = (await openReadingTaskIds(date)).slice(0, COMPLETIONS)
  if (ids.length < COMPLETIONS) throw new Error(`only ${ids.length} open tasks on ${date}`)
  const sockets: Socket[] = []
  try {
    for (let i = 0; i < CLIENTS; i++) sockets.push(await connect(url, cookie))
    log(`sockets: ${sockets.length} connected`)
    // The task being watched: when each client saw its update, and who to wake when all have.
    let watch: { id: number; arrivals: number[]; done: () => void } | null = null
    for (const socket of sockets) {
      socket.on(LIVE_EVENTS.tasksUpdated, ({ tasks }: TasksUpdatedEvent) => {
        if (!watch || !tasks.some((t) => t.id === watch!.id)) return
        watch.arrivals.push(performance.now())
        if (watch.arrivals.length === CLIENTS) watch.done()
      })
    }
    const afterResponse: number[] = []
    const afterRequest: number[] = []
    const spread: number[] = []
    let beforeResponse = 0
    for (const [n, id] of ids.entries()) {
      let done = () => {}
      const allArrived = new Promise<void>((resolve) => (done = resolve))
      const arrivals: number[] = []
      watch = { id, arrivals, done }
      const start = performance.now()
      const res = await fetch(`${url}/api/tasks/${id}/completion`, {
        method: 'POST',
        headers: { cookie, 'content-type': 'application/json' },
        body: completionBody(n),
      })
      await res.text()
      const responded = performance.now()
      if (!res.ok) throw new Error(`completion answered ${res.status}`)
      let timer: NodeJS.Timeout | undefined
      await Promise.race([allArrived, new Promise((resolve) => (timer = setTimeout(resolve, 5000)))])
      clearTimeout(timer)
      if (arrivals.length < CLIENTS) throw new Error(`only ${arrivals.length} of ${CLIENTS} clients got task ${id} within 5 s`)
      const last = Math.max(...arrivals)
      // The server emits before it writes the response, so the event may already be here: that counts as 0.
      afterResponse.push(Math.max(0, last - responded))
      if (last <= responded) beforeResponse++
      afterRequest.push(last - start)
      spread.push(last - Math.min(...arrivals))
    }
    const a = summary(afterResponse)
    const r = summary(afterRequest)
    const f = summary(spread)
    return {
      measurement: `4 socket fan-out, ${CLIENTS} clients`,
      result: `p50 ${ms(a.p50)} / p95 ${ms(a.p95)} after the response`,
      detail: `${COMPLETIONS} completions; all ${CLIENTS} had it before the response in ${beforeResponse}; request sent → last client p50 ${ms(r.p50)} / p95 ${ms(r.p95)}; first → last client p95 ${ms(f.p95)}`,
    }
  } finally {
    for (const s of sockets) s.disconnect()
  }
}
