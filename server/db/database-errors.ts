const DOWN_CODES = new Set([
  'ECONNREFUSED', 'ECONNRESET', 'PROTOCOL_CONNECTION_LOST', 'ETIMEDOUT', 'EPIPE',
  'ER_CON_COUNT_ERROR', 'PROTOCOL_ENQUEUE_AFTER_FATAL_ERROR', 'ER_SERVER_SHUTDOWN',
])

/** True when an error means "the database can't be reached", so callers answer 503 rather than 500. */
export function isDatabaseDown(err: unknown): boolean {
  let current: unknown = err
  for (let depth = 0; current && depth < 4; depth++) {
    const e = current as { code?: string; driverError?: unknown; message?: string }
    if (e.code && DOWN_CODES.has(e.code)) return true
    if (typeof e.message === 'string' && /connect ECONNREFUSED|Connection lost|Pool is closed|closed state/i.test(e.message)) return true
    current = e.driverError
  }
  return false
}
