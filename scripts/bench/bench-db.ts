import mysql from 'mysql2/promise'
import type { DataSource } from 'typeorm'
import { createDataSource, setDataSource } from '#server/db/data-source'
import { loadConfig, type AppConfig } from '#server/lib/config'

/** The throwaway database; another name per worktree lets two benches run at once. */
export const BENCH_DB = process.env.ROUNDTIDE_BENCH_DB_NAME || 'roundtide_bench'
if (!/^roundtide_bench\w*$/.test(BENCH_DB)) throw new Error(`ROUNDTIDE_BENCH_DB_NAME must start with roundtide_bench (got ${BENCH_DB}): the bench drops it`)

/** The app's config pointed at the throwaway bench database, on ROUNDTIDE_BENCH_PORT or a free port. */
export function benchConfig(): AppConfig {
  const base = loadConfig({ ...process.env, ROUNDTIDE_DB_NAME: BENCH_DB, PORT: process.env.ROUNDTIDE_BENCH_PORT || '0', HOST: '127.0.0.1' })
  return { ...base, db: { ...base.db, database: BENCH_DB } }
}

async function admin<T>(fn: (c: mysql.Connection) => Promise<T>): Promise<T> {
  const { db } = benchConfig()
  // No default database: the bench database is dropped and created from here.
  const conn = await mysql.createConnection({ host: db.host, port: db.port, user: db.username, password: db.password })
  try {
    return await fn(conn)
  } finally {
    await conn.end()
  }
}

/** Drops any leftover bench database, creates it empty and migrates it; sets it as the process's connection. */
export async function createBenchDatabase(): Promise<DataSource> {
  await admin(async (c) => {
    await c.query(`DROP DATABASE IF EXISTS \`${BENCH_DB}\``)
    await c.query(`CREATE DATABASE \`${BENCH_DB}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`)
  })
  const ds = createDataSource(benchConfig().db)
  await ds.initialize()
  await ds.runMigrations({ transaction: 'each' })
  setDataSource(ds)
  return ds
}

export async function dropBenchDatabase(ds: DataSource | undefined) {
  if (ds?.isInitialized) await ds.destroy()
  await admin((c) => c.query(`DROP DATABASE IF EXISTS \`${BENCH_DB}\``))
}

/** A plain mysql2 pool on the bench database, for the hand-written floor query. */
export function floorPool(connectionLimit = 2) {
  const { db } = benchConfig()
  return mysql.createPool({ host: db.host, port: db.port, user: db.username, password: db.password, database: BENCH_DB, timezone: 'Z', connectionLimit })
}
