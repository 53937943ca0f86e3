import request from 'supertest'
import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { ROLES, type Role } from '#shared/schemas/person'
import { listRoutes } from '#tests/support/route-list'
import { ensureFacilityAndParameters } from '#tests/support/facility-fixtures'
import { startTestApp, type TestApp } from '#tests/support/test-app'
import { ROUTE_ACCESS, concretePath } from './route-access'
import { requestByMethod } from '../support/request-by-method'

let t: TestApp
const agents = {} as Record<Role, request.Agent>
beforeAll(async () => {
  t = await startTestApp()
  await ensureFacilityAndParameters()
  for (const role of ROLES) agents[role] = (await t.signedInAgent(role)).agent
})
afterAll(() => t.close())

const STATE_CHANGING = new Set(['POST', 'PUT', 'PATCH', 'DELETE'])
const call = (agent: request.Agent | ReturnType<typeof request>, method: string, path: string) => requestByMethod(agent, method, path).send({})

describe('every route has an access rule', () => {
  test('the router and the access table list the same routes', async () => {
    const routes = listRoutes(t.app).map((r) => `${r.method} ${r.path}`)
    const missing = routes.filter((r) => !(r in ROUTE_ACCESS))
    const stale = Object.keys(ROUTE_ACCESS).filter((r) => !routes.includes(r))
    expect(missing, 'routes without an access rule').toEqual([])
    expect(stale, 'access rules for routes that no longer exist').toEqual([])
  })
})

describe('role × route', () => {
  const entries = Object.entries(ROUTE_ACCESS).filter(([, rule]) => rule !== 'public')
  test.each(entries)('%s: allowed roles get through, the others get 403, nobody signed in gets 401', async (key, rule) => {
    const [method, pattern] = key.split(' ')
    const path = concretePath(pattern)
    for (const role of ROLES) {
      const res = await call(agents[role], method, path)
      if ((rule as Role[]).includes(role)) expect([401, 403], `${role} on ${key}: ${res.status} ${JSON.stringify(res.body)}`).not.toContain(res.status)
      else {
        expect(res.status, `${role} on ${key}`).toBe(403)
        expect(res.body.error?.message ?? '').not.toBe('')
      }
      expect(res.status, `${role} on ${key}`).toBeLessThan(500)
    }
    const anonymous = await call(request(t.app), method, path)
    expect(anonymous.status, `anonymous on ${key}`).toBe(401)
  })
})

describe('cross-site requests', () => {
  const changing = Object.keys(ROUTE_ACCESS).filter((k) => STATE_CHANGING.has(k.split(' ')[0]))
  test.each(changing)('%s from another origin is refused with 403 before anything runs', async (key) => {
    const [method, pattern] = key.split(' ')
    const res = await requestByMethod(agents.manager, method, concretePath(pattern)).set('origin', 'https://elsewhere.example').send({})
    expect(res.status).toBe(403)
    expect(res.body.error?.message ?? res.text).toMatch(/another site/)
  })
})
