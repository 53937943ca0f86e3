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
  value: Promise<T>
  generation: number
  loadedAt: number
}

/**
 * A per-process copy of a small, read-mostly table set, loaded on first use. Loads go through
 * `db()`: inside a request they use its own connection (a second one from the pool could wait
 * on requests that each hold one); read committed, so they see only what others committed. A
 * transaction that wrote rows of the kind reads its own state instead of the copy.
 *
 * `read(has)`: when the copy lacks what the caller looks for (`has` answers false), it is loaded
 * again, as a row written by another process since the last load is the likely reason.
 */
export function cachedRead<T>(kind: CachedKind, load: () => Promise<T>) {
  let copy: Copy<T> | undefined
  const fresh = (): Copy<T> => {
    const next: Copy<T> = { value: load(), generation: generationOf(kind), loadedAt: Date.now() }
    // A failed load is not kept: the next read tries again.
    next.value.catch(() => {
      if (copy === next) copy = undefined
    })
    copy = next
    return next
  }
  const usable = (c: Copy<T> | undefined): c is Copy<T> => !!c && c.generation === generationOf(kind) && Date.now() - c.loadedAt < CACHE_MAX_AGE_MS

  return async function read(has?: (value: T) => boolean): Promise<T> {
    if (wroteInTransaction(db().queryRunner, kind)) return load()
    const current = usable(copy) ? copy : fresh()
    const value = await current.value
    if (!has || has(value) || current !== copy || Date.now() - current.loadedAt < MISS_RELOAD_AFTER_MS) return value
    return fresh().value
  }
}

/** Rows shared by every reader of a copy may not be changed by one of them (a mistake fails loudly). */
export function frozen<T extends object>(row: T): T {
  for (const value of Object.values(row)) if (Array.isArray(value)) Object.freeze(value)
  return Object.freeze(row)
}
