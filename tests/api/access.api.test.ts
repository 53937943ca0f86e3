import request from 'supertest'
import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { ROLES, type Role } from '#shared/schemas/person'
import { buildPersonInput } from '#seed/factories'
import { startTestApp, type TestApp } from '#tests/support/test-app'
import { requestByMethod } from '../support/request-by-method'

let t: TestApp
const agents = {} as Record<Role, request.Agent>
beforeAll(async () => {
  t = await startTestApp()
  for (const role of ROLES) agents[role] = (await t.signedInAgent(role)).agent
})
afterAll(() => t.close())

type Call = { method: 'get' | 'post' | 'patch' | 'delete'; path: () => string; body?: () => object }
const ok = (status: number) => status < 400
let someoneId = 0

// Each route so far × each role → allowed or refused; a 403 must say why.
const MATRIX: Array<{ name: string; call: Call; allowed: Role[] }> = [
  { name: 'GET /api/me', call: { method: 'get', path: () => '/api/me' }, allowed: [...ROLES] },
  { name: 'GET /api/people', call: { method: 'get', path: () => '/api/people' }, allowed: ['manager'] },
  { name: 'POST /api/people', call: { method: 'post', path: () => '/api/people', body: () => buildPersonInput() }, allowed: ['manager'] },
  {
    name: 'PATCH /api/people/:id',
    call: { method: 'patch', path: () => `/api/people/${someoneId}`, body: () => ({ title: 'Night cover' }) },
    allowed: ['manager'],
  },
  {
    name: 'POST /api/people/:id/password',
    call: { method: 'post', path: () => `/api/people/${someoneId}/password`, body: () => ({ password: 'another-good-one' }) },
    allowed: ['manager'],
  },
]

describe('role matrix', () => {
  beforeAll(async () => {
    someoneId = (await t.createPersonWithRole('technician')).id
  })

  for (const row of MATRIX) {
    for (const role of ROLES) {
      const expected = row.allowed.includes(role) ? 'allowed' : 'refused with 403'
      test(`${row.name} as ${role} is ${expected}`, async () => {
        const { method, path, body } = row.call
        const res = await agents[role][method](path()).send(body?.() ?? {})
        if (row.allowed.includes(role)) {
          expect(ok(res.status), `status ${res.status}: ${JSON.stringify(res.body)}`).toBe(true)
        } else {
          expect(res.status).toBe(403)
          expect(res.body.error.message).toMatch(/Only .* can do this/)
        }
      })
    }
    test(`${row.name} without signing in answers 401`, async () => {
      const { method, path, body } = row.call
      await requestByMethod(request(t.app), method, path())
        .send(body?.() ?? {})
        .expect(401)
    })
  }
})

describe('cross-site requests', () => {
  test('when a state-changing request comes from another origin, then it is refused with 403 and nothing changes', async () => {
    const input = buildPersonInput()
    const res = await agents.manager.post('/api/people').set('origin', 'https://evil.example').send(input).expect(403)
    expect(res.body.error.message).toMatch(/another site/)
    const list = await agents.manager.get('/api/people').expect(200)
    expect(list.body.map((p: { email: string }) => p.email)).not.toContain(input.email)
  })

  test('when the request comes from our own origin, then it goes through', async () => {
    const res = await agents.manager.post('/api/people').set('origin', 'http://127.0.0.1').set('host', '127.0.0.1').send(buildPersonInput())
    expect(res.status).toBe(201)
  })
})
