import 'reflect-metadata'
import { DataSource } from 'typeorm'
import type { AppConfig } from '../lib/config'
import { entities } from './entities'
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

let current: DataSource | undefined

/** The process-wide connection used by services; set once by server/index.ts or a test. */
export function setDataSource(ds: DataSource) {
  current = ds
}

/** The connection when one is set, for code that must not throw without one (the error handler). */
export const dataSourceIfSet = (): DataSource | undefined => current

export function db(): DataSource {
  if (!current) throw new Error('The database connection has not been set up yet')
  return current
}
