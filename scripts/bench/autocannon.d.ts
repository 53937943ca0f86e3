// autocannon 9 ships no types; this covers the part of its programmatic API the bench uses.
declare module 'autocannon' {
  import type { EventEmitter } from 'node:events'

  interface RequestParams {
    method?: string
    path?: string
    headers?: Record<string, string>
    body?: string | Buffer
  }
  interface Request extends RequestParams {
    setupRequest?: (req: RequestParams, context: Record<string, unknown>) => RequestParams | null
    onResponse?: (status: number, body: string, context: Record<string, unknown>) => void
  }
  interface Client extends EventEmitter {
    setHeaders: (headers: Record<string, string>) => void
  }
  interface Options {
    url: string
    connections?: number
    amount?: number
    duration?: number
    timeout?: number
    headers?: Record<string, string>
    requests?: Request[]
    setupClient?: (client: Client) => void
  }
  interface Histogram {
    average: number
    p50: number
    p90: number
    p99: number
    max: number
  }
  interface Result {
    duration: number
    latency: Histogram
    requests: Histogram & { total: number }
    errors: number
    timeouts: number
    non2xx: number
    '2xx': number
  }
  interface Instance extends EventEmitter, PromiseLike<Result> {
    stop: () => void
  }
  function autocannon(opts: Options): Instance
  export default autocannon
}
