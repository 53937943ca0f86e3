import request from 'supertest'
import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { TEST_PASSWORD } from '#seed/factories'
import { startTestApp, type TestApp } from '#tests/support/test-app'

let t: TestApp
beforeAll(async () => {
  t = await startTestApp({ signInLimitPerAccount: 3, signInLimitPerAddress: 1000 })
})
afterAll(() => t.close())

describe('POST /api/session', () => {
  test('when the e-mail and password match, then it answers 200 with the person and no password hash', async () => {
    const person = await t.createPersonWithRole('technician')
    const res = await request(t.app).post('/api/session').send({ email: person.email, password: TEST_PASSWORD }).expect(200)
    expect(res.body).toMatchObject({ id: person.id, email: person.email, role: 'technician' })
    expect(res.body).not.toHaveProperty('passwordHash')
    expect(res.body).not.toHaveProperty('sessionVersion')
    const cookie = String(res.headers['set-cookie'])
    expect(cookie).toMatch(/roundtide\.sid=/)
    expect(cookie).toMatch(/HttpOnly/i)
    expect(cookie).toMatch(/SameSite=Lax/i)
  })

  test('when the password is wrong or the person does not exist, then both get the same 401 message', async () => {
    const person = await t.createPersonWithRole('technician')
    const wrong = await request(t.app).post('/api/session').send({ email: person.email, password: 'not-the-password' }).expect(401)
    const nobody = await request(t.app).post('/api/session').send({ email: 'nobody-here@roundtide.example', password: 'whatever-it-is' }).expect(401)
    expect(wrong.body.error.message).toBe(nobody.body.error.message)
    expect(wrong.body.error.code).toBe('unauthenticated')
  })

  test('when one account fails too often, then further tries get 429 with a clear message', async () => {
    const person = await t.createPersonWithRole('technician')
    for (let i = 0; i < 3; i++) {
      await request(t.app)
        .post('/api/session')
        .send({ email: person.email, password: `wrong-${i}-password` })
        .expect(401)
    }
    const res = await request(t.app).post('/api/session').send({ email: person.email, password: TEST_PASSWORD }).expect(429)
    expect(res.body.error.code).toBe('rate_limited')
    expect(res.body.error.message).toMatch(/Too many failed sign-in attempts/)
  })

  test('when a deactivated person signs in, then it is refused like a wrong password', async () => {
    const person = await t.createPersonWithRole('technician')
    const { agent: manager } = await t.signedInAgent('manager')
    await manager.patch(`/api/people/${person.id}`).send({ active: false }).expect(200)
    await request(t.app).post('/api/session').send({ email: person.email, password: TEST_PASSWORD }).expect(401)
  })

  test('when a signed-in person is deactivated, then their open session ends at once', async () => {
    const { agent, person } = await t.signedInAgent('technician')
    await agent.get('/api/me').expect(200)
    const { agent: manager } = await t.signedInAgent('manager')
    await manager.patch(`/api/people/${person.id}`).send({ active: false }).expect(200)
    await agent.get('/api/me').expect(401)
  })

  test('when the app restarts, then the session from before still works (sessions live in MariaDB)', async () => {
    const { agent } = await t.signedInAgent('supervisor')
    const cookie = (await agent.get('/api/me').expect(200)).request.cookies
    const restarted = t.newApp()
    const res = await request(restarted).get('/api/me').set('cookie', cookie).expect(200)
    expect(res.body.role).toBe('supervisor')
  })

  test('when the sign-in body is not JSON, then it answers 400, not 500', async () => {
    const res = await request(t.app).post('/api/session').set('content-type', 'application/json').send('{"email": oops').expect(400)
    expect(res.body.error.code).toBe('validation_failed')
  })

  test('when the e-mail is malformed, then it answers 400 naming the field', async () => {
    const res = await request(t.app).post('/api/session').send({ email: 'not-an-email', password: 'x' }).expect(400)
    expect(res.body.error.fieldErrors).toHaveProperty('email')
  })
})

describe('DELETE /api/session', () => {
  test('when a person signs out, then the old cookie no longer works', async () => {
    const { agent } = await t.signedInAgent('technician')
    const cookie = (await agent.get('/api/me').expect(200)).request.cookies
    await agent.delete('/api/session').expect(204)
    await request(t.app).get('/api/me').set('cookie', cookie).expect(401)
  })
})

describe('GET /api/me', () => {
  test('when nobody is signed in, then it answers 401', async () => {
    const res = await request(t.app).get('/api/me').expect(401)
    expect(res.body.error.code).toBe('unauthenticated')
  })
})

describe('a session in use', () => {
  test('its expiry is pushed a week ahead by the first request, then at most once a minute, not by every request', async () => {
    const person = await t.createPersonWithRole('technician')
    const agent = request.agent(t.app)
    await agent.post('/api/session').send({ email: person.email, password: TEST_PASSWORD }).expect(200)
    const [{ sid }] = (await t.dataSource.query('SELECT session_id AS sid FROM sessions WHERE data LIKE ? ORDER BY expires DESC LIMIT 1', [
      `%"id":${person.id},%`,
    ])) as Array<{ sid: string }>
    const soon = Math.floor(Date.now() / 1000) + 100
    const expiry = async () =>
      Number(((await t.dataSource.query('SELECT expires FROM sessions WHERE session_id = ?', [sid])) as Array<{ expires: number }>)[0].expires)

    await t.dataSource.query('UPDATE sessions SET expires = ? WHERE session_id = ?', [soon, sid])
    await agent.get('/api/me').expect(200)
    expect(await expiry()).toBeGreaterThan(soon + 6 * 24 * 3600)

    await t.dataSource.query('UPDATE sessions SET expires = ? WHERE session_id = ?', [soon, sid])
    await agent.get('/api/me').expect(200)
    await agent.get('/api/me').expect(200)
    expect(await expiry()).toBe(soon)
  })
})
