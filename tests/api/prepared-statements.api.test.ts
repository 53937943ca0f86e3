import { randomUUID } from 'node:crypto'
import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { dataSource, db } from '#server/db/data-source'
import { findById, insertRows } from '#server/db/prepared'
import { AuditEntity } from '#server/modules/audit/audit.entity'
import { TaskEntity } from '#server/modules/tasks/task.entity'
import { ensureFacilityAndParameters, makeAreaWithTanks } from '#tests/support/facility-fixtures'
import { completion, makeTankTask } from '#tests/support/task-fixtures'
import { startTestApp, type TestApp } from '#tests/support/test-app'

// The completion path reads and writes its fixed statements by hand (record 16h): inside a
// transaction as prepared statements, outside through TypeORM's pool. Either way the rows must be
// the ones TypeORM itself reads and writes, or every caller of getTaskRow would see other values.
let t: TestApp
beforeAll(async () => {
  t = await startTestApp()
  await ensureFacilityAndParameters()
})
afterAll(() => t.close())

const inTransaction = <T>(work: () => Promise<T>) => dataSource().manager.transaction(() => work())

describe('statements written by hand read and write what TypeORM does', () => {
  test('when a finished task is read by hand, in a transaction or not, then it equals the repository read', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const task = await makeTankTask(tanks[0], {
      requiredReadings: ['do_mgL', 'temp_c'],
      assignedManually: true,
      status: 'done',
      flag: 'watch',
      lateMinutes: 7,
      completedAt: new Date('2026-12-05T08:15:30.123Z'),
    })
    const expected = await db().getRepository(TaskEntity).findOneByOrFail({ id: task.id })
    expect(await inTransaction(() => findById(TaskEntity, task.id))).toEqual(expected)
    expect(await findById(TaskEntity, task.id)).toEqual(expected)
    expect(expected).toMatchObject({ requiredReadings: ['do_mgL', 'temp_c'], assignedManually: true, edited: false })
    expect(await inTransaction(() => findById(TaskEntity, 2_000_000_000))).toBeNull()
  })

  test('when an audit row is written by hand, then it reads back as the same row written by the repository', async () => {
    const entityId = randomUUID().slice(0, 12)
    const fields = {
      at: new Date('2026-12-05T09:00:00.250Z'),
      personId: null,
      entity: 'completion' as const,
      action: 'create' as const,
      before: null,
      after: { taskId: 12, flag: 'watch', readings: [{ key: 'do_mgL', value: 4.5 }], note: 'Pump "B" restarted' },
    }
    await inTransaction(() => insertRows(AuditEntity, [{ ...fields, entityId: `${entityId}-hand` }]))
    await db()
      .getRepository(AuditEntity)
      .insert({ ...fields, entityId: `${entityId}-orm` } as never)
    const read = (suffix: string) =>
      db()
        .getRepository(AuditEntity)
        .findOneByOrFail({ entityId: `${entityId}-${suffix}` })
    const { id: _hand, entityId: _h, ...byHand } = await read('hand')
    const { id: _orm, entityId: _o, ...byOrm } = await read('orm')
    expect(byHand).toEqual(byOrm)
    expect(byHand.after).toEqual(fields.after)
  })

  test('when a completion id already used for one task is sent for another, then it answers 409 and the other task stays open', async () => {
    const { tanks } = await makeAreaWithTanks(2)
    const [first, second] = [await makeTankTask(tanks[0]), await makeTankTask(tanks[1])]
    const { agent } = await t.signedInAgent('technician')
    const body = completion({ do_mgL: 7.5, temp_c: 27 })
    await agent.post(`/api/tasks/${first.id}/completion`).send(body).expect(200)
    const res = await agent.post(`/api/tasks/${second.id}/completion`).send(body).expect(409)
    expect(res.body.error.message).toBe('That completion id was already used for another task.')
    expect((await db().getRepository(TaskEntity).findOneByOrFail({ id: second.id })).status).toBe('open')
  })
})
