import { randomUUID } from 'node:crypto'
import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import type request from 'supertest'
import { In } from 'typeorm'
import { db } from '#server/db/data-source'
import { foreignKeyConflict } from '#server/db/unique-conflicts'
import { CompletionEntity, PhotoEntity } from '#server/modules/completions/completion.entities'
import { PersonEntity } from '#server/modules/people/person.entity'
import { TaskEntity } from '#server/modules/tasks/task.entity'
import { keysIn, ruleOf } from '#tests/support/foreign-keys'
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

const dbError = (err: unknown) => (err as { driverError?: { code?: string } }).driverError?.code ?? (err as { code?: string }).code

let t: TestApp
let manager: request.Agent
beforeAll(async () => {
  t = await startTestApp()
  await ensureFacilityAndParameters()
  manager = (await t.signedInAgent('manager')).agent
})
afterAll(() => t.close())

/** A new tank with a daily routine on it, so it has planned tasks. */
async function tankOnARoutine() {
  const { tanks } = await makeAreaWithTanks(1)
  const routine = (
    await manager
      .post('/api/routines')
      .send(routineInput({ targetIds: [tanks[0].id] }))
      .expect(201)
  ).body as { id: number }
  return { tanks, routine }
}

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
    const { tanks } = await tankOnARoutine()
    await makeTankTask(tanks[0], { status: 'done', completedAt: new Date(), dueAt: new Date(Date.now() - 3_600_000) })
    const tasksBefore = await db().getRepository(TaskEntity).countBy({ tankId: tanks[0].id })
    const refused = await manager.delete(`/api/tanks/${tanks[0].id}`).expect(409)
    expect(refused.body.error.message).toMatch(/still in use/)
    await manager.get(`/api/tanks/${tanks[0].id}`).expect(200)
    // The planned tasks cleared before the delete came back with the refused request.
    expect(await db().getRepository(TaskEntity).countBy({ tankId: tanks[0].id })).toBe(tasksBefore)
  })

  test('a tank with only planned tasks can still be deleted; its planned tasks go with it', async () => {
    const { tanks } = await tankOnARoutine()
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
    const { tanks, routine } = await tankOnARoutine()
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
