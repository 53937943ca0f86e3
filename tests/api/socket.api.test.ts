import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { ensureFacilityAndParameters, makeAreaWithTanks } from '#tests/support/facility-fixtures'
import { connected, nextTask, startLiveServer, type LiveServer } from '#tests/support/live-server'
import { completion, makeTankTask } from '#tests/support/task-fixtures'

let live: LiveServer
const signIn: LiveServer['signIn'] = (role) => live.signIn(role)
const connect: LiveServer['connect'] = (opts) => live.connect(opts)

beforeAll(async () => {
  live = await startLiveServer()
  await ensureFacilityAndParameters()
})
afterAll(() => live?.stop())

describe('socket.io live updates', () => {
  test('when one person completes a task over HTTP, then another signed-in socket receives the changed task', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const task = await makeTankTask(tanks[0])
    const tech = await signIn('technician')
    const watcher = await signIn('supervisor')
    const socket = connect({ extraHeaders: { cookie: watcher.cookie } })
    await connected(socket)

    const updated = nextTask(socket, (t) => t.id === task.id)
    await tech.agent
      .post(`/api/tasks/${task.id}/completion`)
      .send(completion({ do_mgL: 6.8, temp_c: 28.2 }))
      .expect(200)
    expect(await updated).toMatchObject({ id: task.id, status: 'done', completedById: tech.person.id, flag: null })
  })

  test('when a flagged completion makes a recheck, then sockets (websocket transport too) receive the new recheck task', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const task = await makeTankTask(tanks[0])
    const tech = await signIn('technician')
    const watcher = await signIn('technician')
    const socket = connect({ extraHeaders: { cookie: watcher.cookie }, transports: ['websocket'] })
    await connected(socket)

    const created = nextTask(socket, (t) => t.recheckOfTaskId === task.id)
    const res = await tech.agent
      .post(`/api/tasks/${task.id}/completion`)
      .send(completion({ do_mgL: 3.2, temp_c: 28 }))
      .expect(200)
    expect(await created).toMatchObject({ id: res.body.recheckTaskId, status: 'open', assigneeId: tech.person.id })
  })

  test('when a socket has no session cookie (or a forged one), then it gets connect_error and no connection', async () => {
    for (const opts of [{}, { extraHeaders: { cookie: 'roundtide.sid=s%3Aforged.nope' } }]) {
      const error = await connected(connect(opts)).then(
        () => null,
        (e: Error & { description?: unknown }) => e,
      )
      expect(error?.description).toBe(403) // the handshake itself is refused, before any event can flow
    }
    const ws = connect({ transports: ['websocket'] })
    await expect(connected(ws)).rejects.toBeInstanceOf(Error)
    expect(ws.connected).toBe(false)
  })
})
