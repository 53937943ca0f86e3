const DOWN_CODES = new Set([
  'ECONNREFUSED',
  'ECONNRESET',
  'PROTOCOL_CONNECTION_LOST',
  'ETIMEDOUT',
  'EPIPE',
  'ER_CON_COUNT_ERROR',
  'PROTOCOL_ENQUEUE_AFTER_FATAL_ERROR',
  'ER_SERVER_SHUTDOWN',
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

/**
 * The name of the unique key a write ran into (MariaDB ER_DUP_ENTRY, errno 1062), or null when
 * the error is something else. TypeORM wraps the driver's error, so both layers are read.
 */
export function duplicateKeyName(err: unknown): string | null {
  let current: unknown = err
  for (let depth = 0; current && depth < 4; depth++) {
    const e = current as { code?: string; errno?: number; sqlMessage?: string; message?: string; driverError?: unknown }
    if (e.code === 'ER_DUP_ENTRY' || e.errno === 1062) {
      return /for key '(?:[^'.]+\.)?([^']+)'/.exec(e.sqlMessage ?? e.message ?? '')?.[1] ?? ''
    }
    current = e.driverError
  }
  return null
}

/**
 * Which foreign key refused a write (record 13f): `missing-parent` when the row points at nothing
 * (ER_NO_REFERENCED_ROW_2, errno 1452), `in-use` when a deleted row is still pointed at
 * (ER_ROW_IS_REFERENCED_2, errno 1451), with the pointing column; null for any other error.
 */
export function foreignKeyRefusal(err: unknown): { kind: 'missing-parent' | 'in-use'; column: string | null } | null {
  let current: unknown = err
  for (let depth = 0; current && depth < 4; depth++) {
    const e = current as { code?: string; errno?: number; sqlMessage?: string; message?: string; driverError?: unknown }
    const kind =
      e.code === 'ER_NO_REFERENCED_ROW_2' || e.errno === 1452 ? 'missing-parent' : e.code === 'ER_ROW_IS_REFERENCED_2' || e.errno === 1451 ? 'in-use' : null
    if (kind) return { kind, column: /FOREIGN KEY \(`([^`]+)`\)/.exec(e.sqlMessage ?? e.message ?? '')?.[1] ?? null }
    current = e.driverError
  }
  return null
}
