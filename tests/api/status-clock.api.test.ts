import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { db } from '#server/db/data-source'
import { advanceTaskStatuses } from '#server/jobs/status-clock'
import { startScheduler } from '#server/jobs/scheduler'
import { AlertEntity } from '#server/modules/completions/completion.entities'
import { TaskEntity } from '#server/modules/tasks/task.entity'
import { ensureFacilityAndParameters, makeAreaWithTanks } from '#tests/support/facility-fixtures'
import { makeTankTask } from '#tests/support/task-fixtures'
import { startTestApp, type TestApp } from '#tests/support/test-app'

let t: TestApp
beforeAll(async () => {
  t = await startTestApp({}, { ownDatabase: true })
  await ensureFacilityAndParameters()
})
afterAll(() => t.close())

const statusOf = async (id: number) => (await db().getRepository(TaskEntity).findOneByOrFail({ id })).status
const minutes = (n: number) => n * 60_000

describe('status clock', () => {
  test('a task moves planned → open → overdue → missed as its window, due time and grace pass', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const due = new Date(Date.now() + minutes(600))
    const task = await makeTankTask(tanks[0], {
      status: 'planned',
      dueAt: due,
      windowStartAt: new Date(due.getTime() - minutes(30)),
      graceUntil: new Date(due.getTime() + minutes(60)),
    })
    await advanceTaskStatuses(db(), new Date(due.getTime() - minutes(31)))
    expect(await statusOf(task.id)).toBe('planned')
    await advanceTaskStatuses(db(), new Date(due.getTime() - minutes(29)))
    expect(await statusOf(task.id)).toBe('open')
    await advanceTaskStatuses(db(), new Date(due.getTime() + minutes(1)))
    expect(await statusOf(task.id)).toBe('overdue')
    const { missed } = await advanceTaskStatuses(db(), new Date(due.getTime() + minutes(61)))
    expect(missed).toContain(task.id)
    expect(await statusOf(task.id)).toBe('missed')
  })

  test('after downtime, a task whose grace passed goes straight to missed once, with one alert, however often the clock catches up', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const due = new Date(Date.now() + minutes(900))
    const task = await makeTankTask(tanks[0], {
      status: 'planned',
      dueAt: due,
      windowStartAt: new Date(due.getTime() - minutes(30)),
      graceUntil: new Date(due.getTime() + minutes(60)),
    })
    const later = new Date(due.getTime() + minutes(300))
    const first = await advanceTaskStatuses(db(), later)
    const second = await advanceTaskStatuses(db(), later)
    expect(first.missed).toContain(task.id)
    expect(second.missed).not.toContain(task.id)
    expect(await db().getRepository(AlertEntity).countBy({ taskId: task.id, kind: 'missed_task' })).toBe(1)
  })

  test('held, done and skipped tasks never move', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const past = new Date(Date.now() - minutes(600))
    const held = await makeTankTask(tanks[0], { status: 'held', heldReason: 'Fasting before transfer', dueAt: past, windowStartAt: past, graceUntil: past })
    const done = await makeTankTask(tanks[0], { status: 'done', dueAt: new Date(past.getTime() + 1000), windowStartAt: past, graceUntil: past })
    await advanceTaskStatuses(db(), new Date())
    expect(await statusOf(held.id)).toBe('held')
    expect(await statusOf(done.id)).toBe('done')
  })

  test('two schedulers against one database: only one holds the lock and acts', async () => {
    const lockName = `test_lock_${Date.now()}`
    const a = startScheduler(db(), { intervalMs: 60_000, lockName })
    const b = startScheduler(db(), { intervalMs: 60_000, lockName })
    await Promise.all([a.tick(), b.tick()])
    expect([a.isLeader(), b.isLeader()].filter(Boolean)).toHaveLength(1)
    const leader = a.isLeader() ? a : b
    const follower = a.isLeader() ? b : a
    await leader.stop()
    await follower.tick()
    expect(follower.isLeader()).toBe(true)
    await follower.stop()
  })
})
