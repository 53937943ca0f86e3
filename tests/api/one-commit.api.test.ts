import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { In } from 'typeorm'
import { db } from '#server/db/data-source'
import { advanceTaskStatuses } from '#server/jobs/status-clock'
import { AuditEntity } from '#server/modules/audit/audit.entity'
import { AlertEntity, CompletionEntity, ReadingEntity } from '#server/modules/completions/completion.entities'
import { TaskEntity } from '#server/modules/tasks/task.entity'
import { ChangeOutboxEntity } from '#server/realtime/change-outbox.entity'
import { ensureFacilityAndParameters, makeAreaWithTanks } from '#tests/support/facility-fixtures'
import { completion, makeTankTask } from '#tests/support/task-fixtures'
import { failingInsert } from '#tests/support/failing-insert'
import { startTestApp, type TestApp } from '#tests/support/test-app'

let t: TestApp
beforeAll(async () => {
  t = await startTestApp()
  await ensureFacilityAndParameters()
})
afterAll(() => t.close())

const outboxFor = (taskIds: number[]) =>
  db()
    .getRepository(ChangeOutboxEntity)
    .findBy({ kind: 'task', entityId: In(taskIds.map(String)) })

describe('a request is one commit', () => {
  test('when a flagged completion commits, then its recheck, alert, stored answer and outbox rows are there with it', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const task = await makeTankTask(tanks[0])
    const { agent } = await t.signedInAgent('technician')
    const res = await agent
      .post(`/api/tasks/${task.id}/completion`)
      .send(completion({ do_mgL: 3.1, temp_c: 28 }))
      .expect(200)
    const stored = await db().getRepository(CompletionEntity).findOneByOrFail({ taskId: task.id })
    expect(stored.response).toMatchObject({ recheckTaskId: res.body.recheckTaskId, task: { id: task.id, status: 'done' } })
    expect(await db().getRepository(AlertEntity).countBy({ taskId: task.id, kind: 'critical_reading' })).toBe(1)
    const changed = (await outboxFor([task.id, res.body.recheckTaskId])).map((r) => Number(r.entityId)).sort((a, b) => a - b)
    expect(changed).toEqual([task.id, res.body.recheckTaskId].sort((a, b) => a - b))
  })

  test('when the recheck of a flagged completion cannot be written, then it answers 500 and nothing of the completion is kept', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const task = await makeTankTask(tanks[0])
    const { agent } = await t.signedInAgent('technician')
    const body = completion({ do_mgL: 3.1, temp_c: 28 })
    await failingInsert('tasks', `NEW.recheckOfTaskId = ${task.id}`, () => agent.post(`/api/tasks/${task.id}/completion`).send(body).expect(500))

    const after = await db().getRepository(TaskEntity).findOneByOrFail({ id: task.id })
    expect(after).toMatchObject({ status: 'open', flag: null, completedAt: null, version: task.version })
    expect(await db().getRepository(CompletionEntity).countBy({ taskId: task.id })).toBe(0)
    expect(await db().getRepository(ReadingEntity).countBy({ taskId: task.id })).toBe(0)
    expect(await db().getRepository(AlertEntity).countBy({ taskId: task.id })).toBe(0)
    expect(await outboxFor([task.id])).toHaveLength(0)

    // The same completion sent again once the database accepts it does all of it, once.
    const retry = await agent.post(`/api/tasks/${task.id}/completion`).send(body).expect(200)
    expect(retry.body.recheckTaskId).toEqual(expect.any(Number))
    expect(await db().getRepository(AlertEntity).countBy({ taskId: task.id, kind: 'critical_reading' })).toBe(1)
  })

  test('when the audit row of a board move cannot be written, then the move is undone and the card keeps its version', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const task = await makeTankTask(tanks[0], { assigneeId: null })
    const { agent } = await t.signedInAgent('supervisor')
    await failingInsert('audit_log', `NEW.entity = 'assignment' AND NEW.entityId = '${task.id}'`, () =>
      agent.patch(`/api/tasks/${task.id}`).send({ version: task.version, date: task.localDate, assigneeId: null }).expect(500),
    )
    expect(await db().getRepository(TaskEntity).findOneByOrFail({ id: task.id })).toMatchObject({ version: task.version })
    expect(
      await db()
        .getRepository(AuditEntity)
        .countBy({ entity: 'assignment', entityId: String(task.id) }),
    ).toBe(0)
    expect(await outboxFor([task.id])).toHaveLength(0)
  })
})

describe('a scheduler step is one commit', () => {
  test('when the missed-task alert cannot be written, then the task stays overdue and no change is queued, and the next tick does it all', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const graceUntil = new Date(Date.now() - 60_000)
    const task = await makeTankTask(tanks[0], {
      status: 'overdue',
      dueAt: new Date(graceUntil.getTime() - 3_600_000),
      windowStartAt: new Date(graceUntil.getTime() - 5_400_000),
      graceUntil,
    })
    await failingInsert('alerts', `NEW.taskId = ${task.id}`, async () => {
      await expect(advanceTaskStatuses(db(), new Date())).rejects.toThrow(/refused by the test/)
    })
    expect((await db().getRepository(TaskEntity).findOneByOrFail({ id: task.id })).status).toBe('overdue')
    expect(await outboxFor([task.id])).toHaveLength(0)

    const { missed } = await advanceTaskStatuses(db(), new Date())
    expect(missed).toContain(task.id)
    expect(await db().getRepository(AlertEntity).countBy({ taskId: task.id, kind: 'missed_task' })).toBe(1)
    expect(await outboxFor([task.id])).toHaveLength(1)
  })
})
