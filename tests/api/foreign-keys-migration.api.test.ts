import { randomUUID } from 'node:crypto'
import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { DataSource } from 'typeorm'
import { createDataSource } from '#server/db/data-source'
import { migrations } from '#server/db/migrations/index'
import { ForeignKeys1796560000000 } from '#server/db/migrations/1796560000000-ForeignKeys'
import { keysIn } from '#tests/support/foreign-keys'
import { dropOwnDatabase } from '#tests/support/own-database'
import { testConfig } from '#tests/support/test-app'

const config = testConfig()

describe('adding the keys to a database that already has rows', () => {
  const keysMigration = migrations.indexOf(ForeignKeys1796560000000)
  let name: string
  let before: DataSource
  let full: DataSource
  beforeAll(async () => {
    // A database migrated up to just before the keys, as a deployment of the previous release is.
    name = `${config.db.database}_fk_${randomUUID().slice(0, 8)}`
    const admin = createDataSource(config.db)
    await admin.initialize()
    await admin.query(`CREATE DATABASE \`${name}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`)
    await admin.destroy()
    full = createDataSource({ ...config.db, database: name })
    before = new DataSource({ ...full.options, migrations: migrations.slice(0, keysMigration) })
    await before.initialize()
    await before.runMigrations()
    await full.initialize()
  })
  afterAll(async () => {
    await before?.destroy()
    await full?.destroy()
    if (name) await dropOwnDatabase(config.db, name)
  })

  const insertTask = (routineId: number) =>
    before.query(
      `INSERT INTO tasks (routineId, title, category, instructions, targetKind, targetId, localDate, localStart, occurrenceStart, dueAt, windowStartAt, graceUntil, durationMinutes, status, requiredReadings)
       VALUES (?, 'Old check', 'welfare', '', 'facility', 0, '2026-01-05', '2026-01-05T07:30:00', '2026-01-05T07:30:00', NOW(3), NOW(3), NOW(3), 5, 'done', '[]')`,
      [routineId],
    )

  test('a completion pointing at nothing stops the migration with the table and count named, and nothing changes', async () => {
    await insertTask(424242)
    await before.query("INSERT INTO completions (id, taskId, personId, outcome, doneAt) VALUES (UUID(), 987654, 987654, 'done', NOW(3))")
    await expect(full.runMigrations()).rejects.toThrow(/completions\.taskId: 1 row\(s\) point at missing tasks.*completions\.personId: 1 row/)
    expect(await keysIn(full)).toEqual([])
    // The harmless orphan was not touched either: the refused run changed nothing.
    expect(await full.query('SELECT routineId FROM tasks')).toEqual([{ routineId: 424242 }])
  })

  test('once the completion is repaired, a task of a long-deleted routine loses the pointer and the keys go on; down takes them off again', async () => {
    await full.query('DELETE FROM completions WHERE taskId = 987654')
    await full.runMigrations()
    expect(await full.query('SELECT routineId FROM tasks')).toEqual([{ routineId: null }])
    const added = (await keysIn(full)).length
    // As many as the entities declare: the migration and the entities agree.
    expect(added).toBe(full.entityMetadatas.flatMap((m) => m.foreignKeys).length)

    while ((await full.query('SELECT 1 FROM migrations WHERE name = ?', ['ForeignKeys1796560000000'])).length) await full.undoLastMigration()
    expect(await keysIn(full)).toEqual([])
    await full.runMigrations()
    expect((await keysIn(full)).length).toBe(added)
  })
})
