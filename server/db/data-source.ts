import 'reflect-metadata'
import { AsyncLocalStorage } from 'node:async_hooks'
import { DataSource, type EntityManager } from 'typeorm'
import type { AppConfig } from '../lib/config'
import { entities } from './entities'
import { RoundtideNamingStrategy } from './foreign-keys'
import { migrations } from './migrations'

export function createDataSource(db: AppConfig['db']): DataSource {
  return new DataSource({
    type: 'mariadb',
    host: db.host,
    port: db.port,
    username: db.username,
    password: db.password,
    database: db.database,
    entities,
    migrations,
    namingStrategy: new RoundtideNamingStrategy(),
    synchronize: false,
    // Dates cross the wire as UTC; the server also runs with --default-time-zone=+00:00.
    timezone: 'Z',
    supportBigNumbers: true,
    bigNumberStrings: true,
    charset: 'utf8mb4_unicode_ci',
    poolSize: 20,
    extra: { connectTimeout: 5000, enableKeepAlive: true },
  })
}

/** The transaction this request or scheduler step runs in; `open` goes false once it has ended. */
export interface AmbientTransaction {
  manager: EntityManager
  open: boolean
}

const ambient = new AsyncLocalStorage<AmbientTransaction>()
let current: DataSource | undefined
const commitListeners = new Set<() => void>()

/** Called after every outermost transaction commits (the change publisher listens). */
export function onCommitted(listener: () => void) {
  commitListeners.add(listener)
  return () => commitListeners.delete(listener)
}

export function notifyCommitted() {
  for (const listener of commitListeners) listener()
}

/** Runs `work` with `manager` as what `db()` answers, for everything it awaits. */
export function withAmbient<T>(scope: AmbientTransaction, work: () => T): T {
  return ambient.run(scope, work)
}

/** The process-wide connection used by services; set once by server/index.ts or a test. */
export function setDataSource(ds: DataSource) {
  current = ds
  if (ds) joinAmbientOnTransaction(ds.manager)
}

/** The connection when one is set, for code that must not throw without one (the error handler). */
export const dataSourceIfSet = (): DataSource | undefined => current

export function dataSource(): DataSource {
  if (!current) throw new Error('The database connection has not been set up yet')
  return current
}

/**
 * What services read and write through: the transaction of the request or scheduler step in
 * progress when there is one (so audit rows, follow-ups and outbox rows commit with the change
 * that caused them), otherwise the pool. `db().transaction(...)` inside one joins it (a savepoint).
 */
export function db(): EntityManager {
  const scope = ambient.getStore()
  if (scope?.open) return scope.manager
  return dataSource().manager
}

/**
 * `transaction()` on the pool's manager opens a transaction on a connection of its own; the code
 * inside calls `db()` rather than using the manager it is handed, so make that answer the same one.
 */
function joinAmbientOnTransaction(manager: EntityManager) {
  const original = manager.transaction.bind(manager) as (isolation: unknown, work: (m: EntityManager) => Promise<unknown>) => Promise<unknown>
  const joined = (isolationOrWork: unknown, maybeWork?: (m: EntityManager) => Promise<unknown>) => {
    const work = (typeof isolationOrWork === 'function' ? isolationOrWork : maybeWork) as (m: EntityManager) => Promise<unknown>
    const isolation = typeof isolationOrWork === 'string' ? isolationOrWork : 'READ COMMITTED'
    const result = original(isolation, async (m) => {
      const scope: AmbientTransaction = { manager: m, open: true }
      try {
        return await withAmbient(scope, () => work(m))
      } finally {
        scope.open = false
      }
    })
    return result.then((value) => {
      notifyCommitted()
      return value
    })
  }
  manager.transaction = joined as EntityManager['transaction']
}
