import autocannon from 'autocannon'
import { completionBody, openReadingTaskIds } from './open-tasks'
import { log, ms, summary, type Row } from './stats'

const CONNECTIONS = 50
const MAX_REQUESTS = 1500

/** Measurement 3: completions with readings from 50 concurrent clients, each request on the next open task. */
export async function measureCompletions(url: string, cookie: string, date: string): Promise<Row> {
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
  return {
    measurement: `3 completions, ${CONNECTIONS} clients`,
    result: `${(result['2xx'] / result.duration).toFixed(0)} completions/s, p95 ${ms(s.p95)}`,
    detail: `${result['2xx']} 2xx / ${result.non2xx} other / ${result.errors} errors / ${result.timeouts} timeouts of ${total} in ${result.duration.toFixed(1)} s; p50 ${ms(s.p50)}, p99 ${ms(s.p99)}`,
  }
}
