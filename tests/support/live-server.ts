import { io, type Socket } from 'socket.io-client'
import request from 'supertest'
import { setDataSource } from '#server/db/data-source'
import { createPerson } from '#server/modules/people/people.service'
import { startServer } from '#server/start-server'
import { buildPersonInput, TEST_PASSWORD } from '#seed/factories'
import type { Role } from '#shared/schemas/person'
import type { AppConfig } from '#server/lib/config'
import { LIVE_EVENTS, type TasksUpdatedEvent } from '#shared/schemas/live'
import type { Task } from '#shared/schemas/task'
import { testConfig } from './test-app'

/** The whole server on a free port (HTTP and socket.io), with helpers for signed-in sockets. */
export async function startLiveServer(overrides: Partial<AppConfig> = {}) {
  // Live events go out a moment after each commit; the first pass comes one publish interval after start.
  const server = await startServer(testConfig({ port: 0, publishIntervalMs: 100, ...overrides }), { scheduler: false })
  const sockets: Socket[] = []

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

  return {
    server,
    url: server.url,
    signIn,
    connect,
    async stop() {
      sockets.forEach((s) => s.close())
      await server.stop()
      setDataSource(undefined as never)
    },
  }
}

export type LiveServer = Awaited<ReturnType<typeof startLiveServer>>

export function nextEvent<T>(socket: Socket, event: string, match: (payload: T) => boolean = () => true, ms = 5000) {
  return new Promise<T>((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`no ${event} within ${ms} ms`)), ms)
    socket.on(event, (payload: T) => {
      if (!match(payload)) return
      clearTimeout(timer)
      resolve(payload)
    })
  })
}

/** The next batch of changed tasks (`tasks:updated`) holding a task that matches; resolves with that task. */
export async function nextTask(socket: Socket, match: (task: Task) => boolean, ms = 5000): Promise<Task> {
  const batch = await nextEvent<TasksUpdatedEvent>(socket, LIVE_EVENTS.tasksUpdated, ({ tasks }) => tasks.some(match), ms)
  return batch.tasks.find(match)!
}

export const connected = (socket: Socket) =>
  new Promise<void>((resolve, reject) => {
    socket.once('connect', () => resolve())
    socket.once('connect_error', reject)
  })

export const disconnected = (socket: Socket, ms = 3000) =>
  new Promise<string>((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`still connected after ${ms} ms`)), ms)
    socket.once('disconnect', (reason) => {
      clearTimeout(timer)
      resolve(reason)
    })
  })

/**
 * Speaks the socket.io protocol by hand over long-polling, as an attacker's script would:
 * an engine handshake with exactly the given query string, then a connect to the main
 * namespace. Returns how far it got; 'namespace' means the feed would flow to this client.
 */
export async function rawSocketConnect(url: string, query: string, headers: Record<string, string> = {}): Promise<'refused' | 'engine' | 'namespace'> {
  const handshake = await fetch(`${url}/socket.io/?${query}`, { headers })
  const text = await handshake.text()
  const sid = /"sid":"([^"]+)"/.exec(text)?.[1]
  if (handshake.status !== 200 || !sid) return 'refused'
  const session = `${url}/socket.io/?EIO=4&transport=polling&sid=${encodeURIComponent(sid)}`
  await fetch(session, { method: 'POST', body: '40', headers: { ...headers, 'content-type': 'text/plain;charset=UTF-8' } })
  const answer = await (await fetch(session, { headers })).text()
  return answer.split('\u001e').some((packet) => packet.startsWith('40')) ? 'namespace' : 'engine'
}

/** The usual polling handshake (EIO=4, polling) with extra query parameters. */
export const rawPollingConnect = (url: string, query: string, headers: Record<string, string> = {}) =>
  rawSocketConnect(url, `EIO=4&transport=polling&${query}`, headers)
