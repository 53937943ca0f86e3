/** Small helpers shared by the bench modules: progress on stderr, percentiles, rounding. */

export const log = (message: string) => process.stderr.write(`[bench] ${message}\n`)

/** Nearest-rank percentile of unsorted samples (p in 0–100). */
export function percentile(samples: number[], p: number): number {
  if (!samples.length) return Number.NaN
  const sorted = [...samples].sort((a, b) => a - b)
  const rank = Math.min(sorted.length, Math.max(1, Math.ceil((p / 100) * sorted.length)))
  return sorted[rank - 1]
}

export const ms = (value: number) => `${value.toFixed(value < 10 ? 1 : 0)} ms`
export const kb = (bytes: number) => `${(bytes / 1024).toFixed(1)} kB`
export const seconds = (value: number) => `${(value / 1000).toFixed(1)} s`

export function summary(samples: number[]) {
  return { p50: percentile(samples, 50), p95: percentile(samples, 95), p99: percentile(samples, 99), n: samples.length }
}

/** Times an async function in milliseconds. */
export async function timed<T>(fn: () => Promise<T>): Promise<{ value: T; ms: number }> {
  const start = performance.now()
  const value = await fn()
  return { value, ms: performance.now() - start }
}

export interface Row {
  measurement: string
  result: string
  detail?: string
}

/** One aligned text table; long detail cells stay on one line so the table can be pasted. */
export function formatTable(rows: Row[]): string {
  const head: Row = { measurement: 'measurement', result: 'result', detail: 'detail' }
  const all = [head, ...rows]
  const w1 = Math.max(...all.map((r) => r.measurement.length))
  const w2 = Math.max(...all.map((r) => r.result.length))
  const line = (r: Row) => `| ${r.measurement.padEnd(w1)} | ${r.result.padEnd(w2)} | ${r.detail ?? ''}`.trimEnd()
  const rule = `|${'-'.repeat(w1 + 2)}|${'-'.repeat(w2 + 2)}|${'-'.repeat(8)}`
  return [line(head), rule, ...rows.map(line)].join('\n')
}

/** One line for a failed row; for a command, with the last line it printed. */
export function reason(err: unknown): string {
  const message = (err instanceof Error ? err.message : String(err)).split('\n')[0]
  const output = err && typeof err === 'object' ? (err as { output?: unknown }).output : undefined
  const last = typeof output === 'string' ? output.trim().split('\n').pop()?.trim() : undefined
  return (last ? `${message} (${last})` : message).slice(0, 200)
}
