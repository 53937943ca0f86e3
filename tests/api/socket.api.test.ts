import { io, type Socket } from 'socket.io-client'
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { setDataSource } from '#server/db/data-source'
import { createPerson } from '#server/modules/people/people.service'
import { startServer } from '#server/start-server'
import { buildPersonInput, TEST_PASSWORD } from '#seed/factories'
import type { Role } from '#shared/schemas/person'
import type { Task } from '#shared/schemas/task'
import { ensureFacilityAndParameters, makeAreaWithTanks } from '#tests/support/facility-fixtures'
import { completion, makeTankTask } from '#tests/support/task-fixtures'
import { testConfig } from '#tests/support/test-app'

let server: Awaited<ReturnType<typeof startServer>>
const sockets: Socket[] = []

beforeAll(async () => {
  server = await startServer(testConfig({ port: 0 }), { scheduler: false })
  await ensureFacilityAndParameters()
})
afterAll(async () => {
  sockets.forEach((s) => s.close())
  await server?.stop()
  setDataSource(undefined as never)
})

/** A new person of that role, signed in over HTTP; returns their agent and the session cookie. */
async function signIn(role: Role) {
  const person = await createPerson(buildPersonInput({ role }))
  const agent = request.agent(server.url)
  const res = await agent.post('/api/session').send({ email: person.email, password: TEST_PASSWORD }).expect(200)
  const cookie = (res.headers['set-cookie'] as unknown as string[]).map((c) => c.split(';')[0]).join('; ')
  return { person, agent, cookie }
}

function connect(opts: Parameters<typeof io>[1] = {}) {
  const socket = io(server.url, { reconnection: false, forceNew: true, ...opts })
  sockets.push(socket)
  return socket
}

function nextEvent<T>(socket: Socket, event: string, match: (payload: T) => boolean = () => true, ms = 5000) {
  return new Promise<T>((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`no ${event} within ${ms} ms`)), ms)
    socket.on(event, (payload: T) => {
      if (!match(payload)) return
      clearTimeout(timer)
      resolve(payload)
    })
  })
}

const connected = (socket: Socket) =>
  new Promise<void>((resolve, reject) => {
    socket.once('connect', () => resolve())
    socket.once('connect_error', reject)
  })

describe('socket.io live updates', () => {
  test('when one person completes a task over HTTP, then another signed-in socket receives task:updated with it', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const task = await makeTankTask(tanks[0])
    const tech = await signIn('technician')
    const watcher = await signIn('supervisor')
    const socket = connect({ extraHeaders: { cookie: watcher.cookie } })
    await connected(socket)

    const updated = nextEvent<Task>(socket, 'task:updated', (t) => t.id === task.id)
    await tech.agent.post(`/api/tasks/${task.id}/completion`).send(completion({ do_mgL: 6.8, temp_c: 28.2 })).expect(200)
    expect(await updated).toMatchObject({ id: task.id, status: 'done', completedById: tech.person.id, flag: null })
  })

  test('when a flagged completion makes a recheck, then sockets (websocket transport too) receive task:created for it', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const task = await makeTankTask(tanks[0])
    const tech = await signIn('technician')
    const watcher = await signIn('technician')
    const socket = connect({ extraHeaders: { cookie: watcher.cookie }, transports: ['websocket'] })
    await connected(socket)

    const created = nextEvent<Task>(socket, 'task:created', (t) => t.recheckOfTaskId === task.id)
    const res = await tech.agent.post(`/api/tasks/${task.id}/completion`).send(completion({ do_mgL: 3.2, temp_c: 28 })).expect(200)
    expect(await created).toMatchObject({ id: res.body.recheckTaskId, status: 'open', assigneeId: tech.person.id })
  })

  test('when a socket has no session cookie (or a forged one), then it gets connect_error and no connection', async () => {
    for (const opts of [{}, { extraHeaders: { cookie: 'roundtide.sid=s%3Aforged.nope' } }]) {
      const error = await connected(connect(opts)).then(() => null, (e: Error & { description?: unknown }) => e)
      expect(error?.description).toBe(401) // the handshake itself is refused, before any event can flow
    }
    const ws = connect({ transports: ['websocket'] })
    await expect(connected(ws)).rejects.toBeInstanceOf(Error)
    expect(ws.connected).toBe(false)
  })
})
