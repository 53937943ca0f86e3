import autocannon from 'autocannon'
import { measureCompletionFloor } from './completion-floor'
import { completionBody, openReadingTaskIds } from './open-tasks'
import { log, ms, summary, type Row } from './stats'

const CONNECTIONS = 50
const MAX_REQUESTS = 1500
const RATE_GOAL = 400
const P95_GOAL_MS = 100
const RATIO_GOAL = 2

/**
 * Measurement 3: completions with readings from 50 concurrent clients, each request on the next
 * open task; then the same number written by hand on another day (the floor).
 */
export async function measureCompletions(url: string, cookie: string, date: string, floorDate: string, personId: number): Promise<Row[]> {
  const ids = await openReadingTaskIds(date)
  // Margin: autocannon builds a request per client before the first response.
  const amount = Math.min(MAX_REQUESTS, ids.length - CONNECTIONS * 2)
  if (amount < 200) throw new Error(`only ${ids.length} open DO/temperature tasks on ${date}`)
  let next = 0
  const latencies: number[] = []
  const instance = autocannon({
    url,
    connections: CONNECTIONS,
    amount,
    timeout: 30,
    setupClient: (client) => client.setHeaders({ cookie, 'content-type': 'application/json' }),
    requests: [
      {
        method: 'POST',
        setupRequest: (req) => {
          const n = Math.min(next++, ids.length - 1)
          return { ...req, path: `/api/tasks/${ids[n]}/completion`, body: completionBody(n) }
        },
      },
    ],
  })
  instance.on('response', (_client: unknown, _status: number, _bytes: number, responseTime: number) => latencies.push(responseTime))
  const progress = setInterval(() => log(`completions: ${latencies.length}/${amount}`), 2000)
  const result = await Promise.resolve(instance).finally(() => clearInterval(progress))
  const s = summary(latencies)
  const total = result['2xx'] + result.non2xx
  const rate = result['2xx'] / result.duration
  const floor = await measureCompletionFloor(floorDate, amount, personId)
  const met = (ok: boolean) => (ok ? 'met' : 'NOT met')
  return [
    {
      measurement: `3 completions, ${CONNECTIONS} clients`,
      result: `${rate.toFixed(0)} completions/s (goal ≥ ${RATE_GOAL}: ${met(rate >= RATE_GOAL)}), p95 ${ms(s.p95)} (goal ≤ ${P95_GOAL_MS} ms: ${met(s.p95 <= P95_GOAL_MS)})`,
      detail: `${result['2xx']} 2xx / ${result.non2xx} other / ${result.errors} errors / ${result.timeouts} timeouts of ${total} in ${result.duration.toFixed(1)} s; p50 ${ms(s.p50)}, p99 ${ms(s.p99)}`,
    },
    floor.row,
    {
      measurement: '3 completions app/floor',
      result: `throughput ${(floor.perSecond / rate).toFixed(1)}× slower, p95 ${(s.p95 / floor.p95).toFixed(1)}× (goal ≤ ${RATIO_GOAL}×: ${met(floor.perSecond / rate <= RATIO_GOAL)})`,
      detail: 'floor completions/s over app completions/s; app p95 over floor p95',
    },
  ]
}
