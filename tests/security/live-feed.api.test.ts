import request from 'supertest'
import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { TEST_PASSWORD } from '#seed/factories'
import { ensureFacilityAndParameters, makeAreaWithTanks } from '#tests/support/facility-fixtures'
import { connected, disconnected, nextTask, rawPollingConnect, startLiveServer, type LiveServer } from '#tests/support/live-server'
import { completion, makeTankTask } from '#tests/support/task-fixtures'

let live: LiveServer
beforeAll(async () => {
  live = await startLiveServer()
  await ensureFacilityAndParameters()
})
afterAll(() => live?.stop())

describe('the live feed needs a signed-in person', () => {
  test.each(['sid=', 'sid=%20', 'sid=0', 'sid[]=', 'sid=undefined', ''])(
    'a hand-written polling handshake with "%s" and no session never reaches the feed',
    async (query) => {
      expect(await rawPollingConnect(live.url, query)).toBe('refused')
    },
  )

  test('an anonymous polling client with an empty sid receives no changed task when a task is completed', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const task = await makeTankTask(tanks[0])
    const tech = await live.signIn('technician')
    const anonymous = live.connect({ query: { sid: '' }, transports: ['polling'] })
    const error = await connected(anonymous).then(
      () => null,
      (e: Error) => e,
    )
    expect(error).toBeInstanceOf(Error)
    const leaked = nextTask(anonymous, (t) => t.id === task.id, 1500).then(
      () => true,
      () => false,
    )
    await tech.agent
      .post(`/api/tasks/${task.id}/completion`)
      .send(completion({ do_mgL: 6.9, temp_c: 28 }))
      .expect(200)
    expect(await leaked).toBe(false)
  })

  test('an anonymous client on the websocket transport alone, with an empty sid, is refused too', async () => {
    const anonymous = live.connect({ query: { sid: '' }, transports: ['websocket'] })
    await expect(connected(anonymous)).rejects.toBeInstanceOf(Error)
    expect(anonymous.connected).toBe(false)
  })

  test('a signed-in cookie sent from a page on another site is refused at the handshake', async () => {
    const { cookie } = await live.signIn('supervisor')
    const foreign = live.connect({ extraHeaders: { cookie, origin: 'http://attacker.invalid' } })
    const error = await connected(foreign).then(
      () => null,
      (e: Error & { description?: unknown }) => e,
    )
    expect(error?.description).toBe(403)
    expect(await rawPollingConnect(live.url, '', { cookie, origin: 'http://attacker.invalid' })).toBe('refused')
    // The same cookie from the app's own page connects.
    const own = live.connect({ extraHeaders: { cookie, origin: live.url } })
    await connected(own)
    expect(own.connected).toBe(true)
  })
})

describe('an open socket ends with the session', () => {
  test('signing out disconnects that session’s socket but not the same person’s other session', async () => {
    const first = await live.signIn('technician')
    const phone = request.agent(live.url)
    const second = await phone.post('/api/session').send({ email: first.person.email, password: TEST_PASSWORD }).expect(200)
    const phoneCookie = (second.headers['set-cookie'] as unknown as string[]).map((c) => c.split(';')[0]).join('; ')
    const socket = live.connect({ extraHeaders: { cookie: first.cookie } })
    const onPhone = live.connect({ extraHeaders: { cookie: phoneCookie } })
    await Promise.all([connected(socket), connected(onPhone)])
    const gone = disconnected(socket)
    await first.agent.delete('/api/session').expect(204)
    expect(await gone).toBe('io server disconnect')
    expect(onPhone.connected).toBe(true)
  })

  test('deactivating a person disconnects every socket they hold', async () => {
    const manager = await live.signIn('manager')
    const tech = await live.signIn('technician')
    const sockets = [
      live.connect({ extraHeaders: { cookie: tech.cookie } }),
      live.connect({ extraHeaders: { cookie: tech.cookie }, transports: ['websocket'] }),
    ]
    await Promise.all(sockets.map(connected))
    const gone = Promise.all(sockets.map((s) => disconnected(s)))
    await manager.agent.patch(`/api/people/${tech.person.id}`).send({ active: false }).expect(200)
    expect(await gone).toEqual(['io server disconnect', 'io server disconnect'])
  })

  test('a password reset disconnects the person’s sockets, and the old cookie cannot reconnect', async () => {
    const manager = await live.signIn('manager')
    const tech = await live.signIn('technician')
    const watcher = await live.signIn('supervisor')
    const socket = live.connect({ extraHeaders: { cookie: tech.cookie } })
    const bystander = live.connect({ extraHeaders: { cookie: watcher.cookie } })
    await Promise.all([connected(socket), connected(bystander)])
    const gone = disconnected(socket)
    await manager.agent.post(`/api/people/${tech.person.id}/password`).send({ password: 'a-brand-new-password' }).expect(200)
    expect(await gone).toBe('io server disconnect')
    expect(bystander.connected).toBe(true)
    const again = live.connect({ extraHeaders: { cookie: tech.cookie } })
    await expect(connected(again)).rejects.toBeInstanceOf(Error)
  })
})
