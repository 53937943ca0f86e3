import { randomUUID } from 'node:crypto'
import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import type request from 'supertest'
import { DataSource, In } from 'typeorm'
import { createDataSource, db } from '#server/db/data-source'
import { migrations } from '#server/db/migrations'
import { foreignKeyConflict } from '#server/db/unique-conflicts'
import { ForeignKeys1796560000000 } from '#server/db/migrations/1796560000000-ForeignKeys'
import { CompletionEntity, PhotoEntity } from '#server/modules/completions/completion.entities'
import { PersonEntity } from '#server/modules/people/person.entity'
import { TaskEntity } from '#server/modules/tasks/task.entity'
import { dropOwnDatabase } from '#tests/support/own-database'
import { ensureFacilityAndParameters, makeAreaWithTanks, routineInput } from '#tests/support/facility-fixtures'
import { makeTankTask } from '#tests/support/task-fixtures'
import { startTestApp, type TestApp } from '#tests/support/test-app'

// Id columns that point at more than one table (or at an outside service), so no key can hold them.
const NOT_A_REFERENCE = new Set([
  'tasks.targetId',
  'limits.scopeId',
  'audit_log.entityId',
  'change_outbox.entityId',
  'notifications.providerId',
  'text_quotas.summaryProviderId',
])

interface KeyRow {
  TABLE_NAME: string
  COLUMN_NAME: string
  REFERENCED_TABLE_NAME: string
  DELETE_RULE: string
}
const keysIn = (ds: DataSource): Promise<KeyRow[]> =>
  ds.query(
    `SELECT k.TABLE_NAME, k.COLUMN_NAME, k.REFERENCED_TABLE_NAME, r.DELETE_RULE
       FROM information_schema.KEY_COLUMN_USAGE k
       JOIN information_schema.REFERENTIAL_CONSTRAINTS r ON r.CONSTRAINT_SCHEMA = k.CONSTRAINT_SCHEMA AND r.CONSTRAINT_NAME = k.CONSTRAINT_NAME
      WHERE k.TABLE_SCHEMA = DATABASE() AND k.REFERENCED_TABLE_NAME IS NOT NULL`,
  )
const ruleOf = (keys: KeyRow[], table: string, column: string) => {
  const key = keys.find((k) => k.TABLE_NAME === table && k.COLUMN_NAME === column)
  return key && `${key.REFERENCED_TABLE_NAME} ${key.DELETE_RULE}`
}
const dbError = (err: unknown) => (err as { driverError?: { code?: string } }).driverError?.code ?? (err as { code?: string }).code

let t: TestApp
let manager: request.Agent
beforeAll(async () => {
  t = await startTestApp()
  await ensureFacilityAndParameters()
  manager = (await t.signedInAgent('manager')).agent
})
afterAll(() => t.close())

describe('foreign keys', () => {
  test('the records a history depends on are held by keys in the database', async () => {
    const keys = await keysIn(t.dataSource)
    expect(ruleOf(keys, 'completions', 'taskId')).toBe('tasks RESTRICT')
    expect(ruleOf(keys, 'completions', 'personId')).toBe('people RESTRICT')
    expect(ruleOf(keys, 'readings', 'completionId')).toBe('completions RESTRICT')
    expect(ruleOf(keys, 'completion_amendments', 'completionId')).toBe('completions RESTRICT')
    expect(ruleOf(keys, 'notifications', 'alertId')).toBe('alerts RESTRICT')
    expect(ruleOf(keys, 'stock_movements', 'correctsId')).toBe('stock_movements RESTRICT')
    expect(ruleOf(keys, 'events', 'playbookId')).toBe('playbooks RESTRICT')
    // A deleted routine's kept tasks stay, without the pointer.
    expect(ruleOf(keys, 'tasks', 'routineId')).toBe('routines SET NULL')
  })

  test('every id column the app maps has a key, except the ones that point at more than one table', async () => {
    const keys = await keysIn(t.dataSource)
    const unkeyed = t.dataSource.entityMetadatas.flatMap((m) =>
      m.columns
        .filter((c) => c.databaseName.endsWith('Id') && !c.isPrimary && !NOT_A_REFERENCE.has(`${m.tableName}.${c.databaseName}`))
        .filter((c) => !ruleOf(keys, m.tableName, c.databaseName))
        .map((c) => `${m.tableName}.${c.databaseName}`),
    )
    expect(unkeyed).toEqual([])
  })

  test('the entities declare the same keys, so a generated migration would not drop them', async () => {
    const pending = await t.dataSource.driver.createSchemaBuilder().log()
    const touchingKeys = pending.upQueries.filter((q) => /FOREIGN KEY/i.test(q.query))
    expect(touchingKeys.map((q) => q.query)).toEqual([])
  })

  test('a completion for a task that does not exist is refused, and would be answered 409 naming the field', async () => {
    const person = await t.createPersonWithRole('technician')
    const refused = await db()
      .getRepository(CompletionEntity)
      .insert({ id: randomUUID(), taskId: 2_000_000_000, personId: person.id, outcome: 'done', doneAt: new Date() })
      .catch((err: unknown) => err)
    expect(dbError(refused)).toBe('ER_NO_REFERENCED_ROW_2')
    expect(foreignKeyConflict(refused)).toMatchObject({ status: 409, fieldErrors: { taskId: ['No longer exists'] } })
  })

  test('a tank with a finished task in its history cannot be deleted; the manager is told it is in use', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    await manager
      .post('/api/routines')
      .send(routineInput({ targetIds: [tanks[0].id] }))
      .expect(201)
    await makeTankTask(tanks[0], { status: 'done', completedAt: new Date(), dueAt: new Date(Date.now() - 3_600_000) })
    const tasksBefore = await db().getRepository(TaskEntity).countBy({ tankId: tanks[0].id })
    const refused = await manager.delete(`/api/tanks/${tanks[0].id}`).expect(409)
    expect(refused.body.error.message).toMatch(/still in use/)
    await manager.get(`/api/tanks/${tanks[0].id}`).expect(200)
    // The planned tasks cleared before the delete came back with the refused request.
    expect(await db().getRepository(TaskEntity).countBy({ tankId: tanks[0].id })).toBe(tasksBefore)
  })

  test('a tank with only planned tasks can still be deleted; its planned tasks go with it', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    await manager
      .post('/api/routines')
      .send(routineInput({ targetIds: [tanks[0].id] }))
      .expect(201)
    expect(await db().getRepository(TaskEntity).countBy({ tankId: tanks[0].id })).toBeGreaterThan(0)
    await manager.delete(`/api/tanks/${tanks[0].id}`).expect(204)
    expect(await db().getRepository(TaskEntity).countBy({ tankId: tanks[0].id })).toBe(0)
  })

  test('a person with completions cannot be deleted; their record keeps its subject', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const person = await t.createPersonWithRole('technician')
    const task = await makeTankTask(tanks[0], { status: 'done', completedAt: new Date(), completedById: person.id })
    await db().getRepository(CompletionEntity).insert({ id: randomUUID(), taskId: task.id, personId: person.id, outcome: 'done', doneAt: new Date() })
    await expect(db().getRepository(PersonEntity).delete(person.id).catch(dbError)).resolves.toBe('ER_ROW_IS_REFERENCED_2')
    expect(await db().getRepository(PersonEntity).countBy({ id: person.id })).toBe(1)
  })

  test('deleting a routine keeps its finished tasks and the planned one with a photo, clearing their routine id', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const routine = (
      await manager
        .post('/api/routines')
        .send(routineInput({ targetIds: [tanks[0].id] }))
        .expect(201)
    ).body
    const done = await makeTankTask(tanks[0], { routineId: routine.id, status: 'done', completedAt: new Date(), dueAt: new Date(Date.now() - 3_600_000) })
    const planned = await db()
      .getRepository(TaskEntity)
      .find({ where: { routineId: routine.id, status: 'planned' }, order: { dueAt: 'ASC' } })
    expect(planned.length).toBeGreaterThan(1)
    const photographer = await t.createPersonWithRole('technician')
    await db()
      .getRepository(PhotoEntity)
      .insert({ id: randomUUID(), taskId: planned[0].id, personId: photographer.id, fileName: 'x.jpg', mimeType: 'image/jpeg', sizeBytes: 1 })

    await manager.delete(`/api/routines/${routine.id}`).expect(204)
    const left = await db()
      .getRepository(TaskEntity)
      .findBy({ id: In(planned.map((p) => p.id).concat(done.id)) })
    expect(left.map((task) => [task.id, task.routineId]).sort()).toEqual(
      [
        [done.id, null],
        [planned[0].id, null],
      ].sort(),
    )
  })
})

describe('adding the keys to a database that already has rows', () => {
  const keysMigration = migrations.indexOf(ForeignKeys1796560000000)
  let name: string
  let before: DataSource
  let full: DataSource
  beforeAll(async () => {
    // A database migrated up to just before the keys, as a deployment of the previous release is.
    name = `${t.config.db.database}_fk_${randomUUID().slice(0, 8)}`
    await t.dataSource.query(`CREATE DATABASE \`${name}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`)
    full = createDataSource({ ...t.config.db, database: name })
    before = new DataSource({ ...full.options, migrations: migrations.slice(0, keysMigration) })
    await before.initialize()
    await before.runMigrations()
    await full.initialize()
  })
  afterAll(async () => {
    await before?.destroy()
    await full?.destroy()
    if (name) await dropOwnDatabase(t.config.db, name)
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
    expect(added).toBe((await keysIn(t.dataSource)).length)

    while ((await full.query('SELECT 1 FROM migrations WHERE name = ?', ['ForeignKeys1796560000000'])).length) await full.undoLastMigration()
    expect(await keysIn(full)).toEqual([])
    await full.runMigrations()
    expect((await keysIn(full)).length).toBe(added)
  })
})
