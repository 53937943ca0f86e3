import request from 'supertest'
import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { TEST_PASSWORD } from '#seed/factories'
import { ensureFacilityAndParameters } from '#tests/support/facility-fixtures'
import { startTestApp, type TestApp } from '#tests/support/test-app'

let t: TestApp
beforeAll(async () => {
  t = await startTestApp({ signInLimitPerAddress: 6, signInLimitPerAccount: 4 })
  await ensureFacilityAndParameters()
})
afterAll(() => t.close())

const sid = (res: request.Response) => /roundtide\.sid=([^;]+)/.exec(String(res.headers['set-cookie']))?.[1]

describe('sessions', () => {
  test('the session id changes at every sign-in, so a planted id is worthless', async () => {
    const person = await t.createPersonWithRole('technician')
    const agent = request.agent(t.app)
    const planted = 's%3Aplanted-session-id.invalidsignature'
    const first = await agent.post('/api/session').set('cookie', `roundtide.sid=${planted}`).send({ email: person.email, password: TEST_PASSWORD }).expect(200)
    const second = await agent.post('/api/session').send({ email: person.email, password: TEST_PASSWORD }).expect(200)
    expect(sid(first)).toBeTruthy()
    expect(sid(first)).not.toBe(planted)
    expect(sid(second)).not.toBe(sid(first))
  })

  test('signing out ends the session on the server, not only in the browser', async () => {
    const person = await t.createPersonWithRole('supervisor')
    const agent = request.agent(t.app)
    const signIn = await agent.post('/api/session').send({ email: person.email, password: TEST_PASSWORD }).expect(200)
    // The cookie holds "s:<id>.<signature>"; the store keys rows by <id>.
    const id = decodeURIComponent(sid(signIn)!).slice(2).split('.')[0]
    const count = async () => Number((await t.dataSource.query('SELECT COUNT(*) AS n FROM sessions WHERE session_id = ?', [id]))[0].n)
    expect(await count()).toBe(1)
    const cookie = `roundtide.sid=${sid(signIn)}`
    await agent.delete('/api/session').expect(204)
    expect(await count()).toBe(0)
    await request(t.app).get('/api/me').set('cookie', cookie).expect(401)
  })
})

describe('brute force', () => {
  test('failed sign-ins are limited per address too, across different accounts', async () => {
    // A fresh app instance so this test has its own counters.
    const app = t.newApp()
    let last = 0
    for (let i = 0; i < 8; i++) {
      const person = await t.createPersonWithRole('technician')
      last = (
        await request(app)
          .post('/api/session')
          .send({ email: person.email, password: `wrong-${i}-pass` })
      ).status
    }
    expect(last).toBe(429)
  })
})

describe('filters cannot inject SQL', () => {
  test.each([
    "/api/tasks?date=2026-06-01&category=welfare' OR '1'='1",
    '/api/tasks?date=2026-06-01&areaId=1 OR 1=1',
    "/api/tasks?date=2026-06-01'; DROP TABLE tasks; --",
    '/api/tasks?date=2026-06-01&status=done%27%20UNION%20SELECT%20passwordHash%20FROM%20people--',
    '/api/reports/welfare?from=2026-06-01&to=2026-06-02&tankIds=1) OR (1=1',
    "/api/audit?from=2026-06-01&to=2026-06-02&entity=x' OR 'a'='a",
  ])('%s is refused or treated as plain data', async (path) => {
    const { agent } = await t.signedInAgent('manager')
    const res = await agent.get(path)
    expect(res.status).toBeLessThan(500)
    expect(JSON.stringify(res.body)).not.toMatch(/\$2[aby]\$/)
    await agent.get('/api/tasks?date=2026-06-01').expect(200)
  })
})

describe('security headers', () => {
  test('pages and API answers carry the usual protective headers', async () => {
    const res = await request(t.app).get('/api/health')
    expect(res.headers['content-security-policy']).toMatch(/default-src 'self'/)
    expect(res.headers['x-content-type-options']).toBe('nosniff')
    expect(res.headers['x-frame-options']).toBe('SAMEORIGIN')
    expect(res.headers['referrer-policy']).toBe('no-referrer')
    expect(res.headers['strict-transport-security']).toBeTruthy()
    expect(res.headers['x-powered-by']).toBeUndefined()
  })

  test('an error answer never shows a stack trace or SQL', async () => {
    const { agent } = await t.signedInAgent('manager')
    const res = await agent.get('/api/tasks/abc')
    expect(res.status).toBe(400)
    expect(JSON.stringify(res.body)).not.toMatch(/at .*\.ts|SELECT|node_modules/)
  })
})
