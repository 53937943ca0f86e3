// autocannon's programmatic API, typed here (it ships no types) and loaded with require so
// these tests depend on no ambient module declaration.
import { createRequire } from 'node:module'

export interface CannonRequest {
  method?: string
  path?: string
  headers?: Record<string, string>
  body?: string
  /** Called before each request; returns the request to send. */
  setupRequest?: (request: CannonRequest, context: Record<string, unknown>) => CannonRequest
  /** Called with each answer and the context its setupRequest filled in. */
  onResponse?: (status: number, body: string, context: Record<string, unknown>) => void
}

export interface CannonOptions {
  url: string
  connections: number
  duration: number
  /** Seconds before a request counts as timed out. */
  timeout: number
  requests: CannonRequest[]
}

interface Histogram {
  average: number
  p50: number
  p90: number
  p97_5: number
  p99: number
  max: number
}

export interface CannonResult {
  duration: number
  errors: number
  timeouts: number
  non2xx: number
  '2xx': number
  '4xx': number
  '5xx': number
  /** Latency of 2xx answers, ms. */
  latency: Histogram
  requests: Histogram & { total: number; sent: number }
  statusCodeStats: Record<string, { count: number }>
}

export type CannonInstance = PromiseLike<CannonResult> & {
  stop(): void
  /** 'reqError': a request got no answer (connection error or timeout). */
  on(event: 'reqError', listener: (error: Error) => void): void
}

type Cannon = (options: CannonOptions) => CannonInstance

export const autocannon = createRequire(import.meta.url)('autocannon') as Cannon

export const pick = <T>(list: readonly T[]): T => list[Math.floor(Math.random() * list.length)]
