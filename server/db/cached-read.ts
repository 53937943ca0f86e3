import { generationOf, wroteInTransaction, type CachedKind } from './cache-generations'
import { db } from './data-source'

/**
 * How long a copy serves at most. Writes in this process make it stale at once; a write by another
 * process (or a script) is seen within this time (record 16e).
 */
export const CACHE_MAX_AGE_MS = 2000

/** A lookup that misses reloads a copy at most this often (a row that is really gone costs no storm of loads). */
const MISS_RELOAD_AFTER_MS = 250

interface Copy<T> {
  value: T
  generation: number
  loadedAt: number
}

/**
 * A per-process copy of a small, read-mostly table set, loaded on first use. Each caller that
 * finds no usable copy loads one through `db()` and keeps it: inside a request that is the
 * request's own connection, and a caller never waits on a load started by another (requests
 * holding every pooled connection while waiting on a load that needs one more would never end).
 * Read committed, so a load sees only what others committed; a transaction that wrote rows of the
 * kind reads its own state instead of the copy. While a copy past its age is being loaded again,
 * others are still served the old one; a copy made stale by a write is never served.
 *
 * `read(has)`: when the copy lacks what the caller looks for (`has` answers false), it is loaded
 * again, as a row written by another process since the last load is the likely reason.
 */
export function cachedRead<T>(kind: CachedKind, load: () => Promise<T>) {
  let copy: Copy<T> | undefined
  let loading = 0

  async function loadAndKeep(): Promise<T> {
    const generation = generationOf(kind)
    const loadedAt = Date.now()
    loading++
    try {
      const value = await load()
      // Not kept when a write made it stale meanwhile, or when a load started later was kept first.
      if (generation === generationOf(kind) && (!copy || copy.generation !== generation || copy.loadedAt <= loadedAt)) copy = { value, generation, loadedAt }
      return value
    } finally {
      loading--
    }
  }

  return async function read(has?: (value: T) => boolean): Promise<T> {
    if (wroteInTransaction(db().queryRunner, kind)) return load()
    const current = copy?.generation === generationOf(kind) ? copy : undefined
    const usable = current && (Date.now() - current.loadedAt < CACHE_MAX_AGE_MS || loading > 0)
    const value = usable ? current.value : await loadAndKeep()
    if (!has || has(value) || Date.now() - (copy?.loadedAt ?? 0) < MISS_RELOAD_AFTER_MS) return value
    return loadAndKeep()
  }
}

/** Rows shared by every reader of a copy may not be changed by one of them (a mistake fails loudly). */
export function frozen<T extends object>(row: T): T {
  for (const value of Object.values(row)) if (Array.isArray(value)) Object.freeze(value)
  return Object.freeze(row)
}
