import { randomUUID } from 'node:crypto'
import { createDataSource } from '#server/db/data-source'
import type { AppConfig } from '#server/lib/config'

/**
 * A freshly migrated database of its own for one test file. Browser journeys read whole days (a
 * round, a board, who is on call), and the escalation clock acts on every alert in its database,
 * so rows left by other files would change what they see and how long a tick takes.
 */
export async function createOwnDatabase(base: AppConfig['db'], label: string): Promise<string> {
  const name = `${base.database}_${label}_${randomUUID().slice(0, 8)}`
  const admin = createDataSource(base)
  await admin.initialize()
  await admin.query(`CREATE DATABASE \`${name}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`)
  await admin.destroy()
  const ds = createDataSource({ ...base, database: name })
  await ds.initialize()
  await ds.runMigrations()
  await ds.destroy()
  return name
}

export async function dropOwnDatabase(base: AppConfig['db'], name: string) {
  const admin = createDataSource(base)
  await admin.initialize()
  await admin.query(`DROP DATABASE IF EXISTS \`${name}\``)
  await admin.destroy()
}
