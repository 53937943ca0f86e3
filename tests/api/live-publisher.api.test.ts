import { randomUUID } from 'node:crypto'
import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import type { Socket } from 'socket.io-client'
import { db } from '#server/db/data-source'
import { advanceTaskStatuses } from '#server/jobs/status-clock'
import { TaskEntity, type TaskRow } from '#server/modules/tasks/task.entity'
import { LIVE_EVENTS, type DataChangedEvent, type TasksChangedEvent, type TasksUpdatedEvent } from '#shared/schemas/live'
import { ensureFacilityAndParameters, makeAreaWithTanks, routineInput, uniqueCode } from '#tests/support/facility-fixtures'
import { connected, nextEvent, nextTask, startLiveServer, type LiveServer } from '#tests/support/live-server'
import { completion, makeTankTask } from '#tests/support/task-fixtures'

let live: LiveServer
beforeAll(async () => {
  live = await startLiveServer()
  await ensureFacilityAndParameters()
})
afterAll(() => live?.stop())

async function watcher(): Promise<Socket> {
  const { cookie } = await live.signIn('technician')
  const socket = live.connect({ extraHeaders: { cookie } })
  await connected(socket)
  return socket
}

const changedKinds = (socket: Socket, kind: DataChangedEvent['kinds'][number]) =>
  nextEvent<DataChangedEvent>(socket, LIVE_EVENTS.dataChanged, (e) => e.kinds.includes(kind))

describe('every kind of change reaches the live feed through the one publisher', () => {
  test('when a supervisor adds a one-off task, then screens receive it', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const socket = await watcher()
    const { agent } = await live.signIn('supervisor')
    const title = `Check the spare pump ${randomUUID().slice(0, 6)}`
    const arrived = nextTask(socket, (t) => t.title === title)
    const { body } = await agent
      .post('/api/tasks')
      .send({
        title,
        category: 'maintenance',
        instructions: '',
        priority: 'routine',
        targetKind: 'tank',
        targetId: tanks[0].id,
        localStart: '2026-12-20T09:00:00',
        graceMinutes: 60,
        durationMinutes: 10,
        assigneeId: null,
        requiredReadings: [],
      })
      .expect(201)
    expect(await arrived).toMatchObject({ id: body.id, title })
  })

  test('when a routine is created, then screens are told routines changed and to refetch their task views', async () => {
    const { tanks } = await makeAreaWithTanks(2)
    const socket = await watcher()
    const { agent } = await live.signIn('supervisor')
    const routines = changedKinds(socket, 'routine')
    const tasks = nextEvent<TasksChangedEvent>(socket, LIVE_EVENTS.tasksChanged, (e) => e.reasons.includes('planned'))
    await agent
      .post('/api/routines')
      .send(routineInput({ targetIds: tanks.map((t) => t.id) }))
      .expect(201)
    await Promise.all([routines, tasks])
  })

  test('when a catalogue entry or a completion is corrected, then screens are told that kind changed', async () => {
    const { area, tanks } = await makeAreaWithTanks(1)
    const socket = await watcher()
    const { agent } = await live.signIn('manager')
    const catalogue = changedKinds(socket, 'catalogue')
    await agent
      .patch(`/api/areas/${area.id}`)
      .send({ name: `Hall ${uniqueCode('A')}` })
      .expect(200)
    await catalogue

    const task = await makeTankTask(tanks[0])
    const done = completion({ do_mgL: 6.8, temp_c: 28.2 })
    await agent.post(`/api/tasks/${task.id}/completion`).send(done).expect(200)
    const amendment = changedKinds(socket, 'amendment')
    await agent
      .post(`/api/completions/${done.completionId}/amendments`)
      .send({ reason: 'Misread the meter', readings: { temp_c: 28.4 } })
      .expect(201)
    await amendment
  })

  test('when a request fails, then nothing of it is sent', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const task = await makeTankTask(tanks[0])
    const socket = await watcher()
    const { agent } = await live.signIn('technician')
    const leaked = nextTask(socket, (t) => t.id === task.id, 1500).then(
      () => true,
      () => false,
    )
    await agent
      .post(`/api/tasks/${task.id}/completion`)
      .send(completion({ do_mgL: 6.8 }))
      .expect(400)
    expect(await leaked).toBe(false)
  })

  test('when the status clock moves more than 500 tasks in one tick, then every one is sent, in batches', async () => {
    const { tanks } = await makeAreaWithTanks(4)
    // Due a while ago, grace still running: the tick makes them overdue (no alerts for other tests to climb).
    const graceUntil = new Date(Date.now() + 3_600_000)
    const title = `Overdue in bulk ${randomUUID().slice(0, 6)}`
    const rows: Array<Partial<TaskRow>> = Array.from({ length: 520 }, (_, i) => {
      const dueAt = new Date(Date.now() - 60_000 - i * 1000)
      const local = dueAt.toISOString().slice(0, 19)
      const tank = tanks[i % tanks.length]
      return {
        routineId: null,
        eventId: null,
        title,
        category: 'welfare',
        instructions: '',
        priority: 'routine',
        targetKind: 'tank',
        targetId: tank.id,
        tankId: tank.id,
        areaId: tank.areaId,
        localDate: local.slice(0, 10),
        localStart: local,
        occurrenceStart: local,
        dueAt,
        windowStartAt: new Date(dueAt.getTime() - 1_800_000),
        graceUntil,
        durationMinutes: 3,
        status: 'open',
        assigneeId: null,
        assignedManually: false,
        edited: false,
        requiredReadings: [],
        version: 1,
      }
    })
    await db()
      .getRepository(TaskEntity)
      .insert(rows as TaskRow[])
    const ids = new Set(
      (
        await db()
          .getRepository(TaskEntity)
          .find({ select: { id: true }, where: { title } })
      ).map((t) => t.id),
    )
    const socket = await watcher()
    const batches: number[] = []
    const seen = new Set<number>()
    const all = new Promise<void>((resolve) =>
      socket.on(LIVE_EVENTS.tasksUpdated, ({ tasks }: TasksUpdatedEvent) => {
        batches.push(tasks.length)
        for (const t of tasks) if (ids.has(t.id) && t.status === 'overdue') seen.add(t.id)
        if (seen.size === ids.size) resolve()
      }),
    )
    try {
      // The scheduler's status step, on its own: a whole tick would also plan every other file's routines.
      await advanceTaskStatuses(db(), new Date())
      await all
    } finally {
      // Finished, so later files' clocks never move them again.
      await db().getRepository(TaskEntity).update({ title }, { status: 'skipped' })
    }
    expect(seen.size).toBe(520)
    expect(Math.max(...batches)).toBeLessThanOrEqual(200)
    expect(batches.length).toBeLessThan(520)
  })
})
