import request from 'supertest'
import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { ensureFacilityAndParameters, makeAreaWithTanks } from '#tests/support/facility-fixtures'
import { makeTankTask } from '#tests/support/task-fixtures'
import { startTestApp, type TestApp } from '#tests/support/test-app'
import { concretePath, ROUTE_ACCESS } from './route-access'

let t: TestApp
let manager: request.Agent
beforeAll(async () => {
  t = await startTestApp()
  await ensureFacilityAndParameters()
  manager = (await t.signedInAgent('manager')).agent
})
afterAll(() => t.close())

const apiReads = Object.keys(ROUTE_ACCESS)
  .filter((k) => k.startsWith('GET /api/'))
  .map((k) => k.slice(4))

describe('personal data is never kept by a browser or proxy cache', () => {
  test.each(apiReads)('GET %s answers with Cache-Control: no-store', async (pattern) => {
    const res = await manager.get(concretePath(pattern))
    expect(res.status).toBeLessThan(500)
    expect(res.headers['cache-control']).toBe('no-store')
  })

  test('refusals and unknown API paths are not cached either', async () => {
    expect((await request(t.app).get('/api/people').expect(401)).headers['cache-control']).toBe('no-store')
    expect((await manager.get('/api/no-such-thing').expect(404)).headers['cache-control']).toBe('no-store')
  })

  test('a CSV export is sent as an attachment with no-store', async () => {
    const res = await manager.get('/api/reports/compliance?from=2026-06-01&to=2026-06-07&format=csv').expect(200)
    expect(res.headers['content-type']).toMatch(/^text\/csv/)
    expect(res.headers['content-disposition']).toMatch(/^attachment/)
    expect(res.headers['cache-control']).toBe('no-store')
  })

  test('an acknowledge page is not cached', async () => {
    const res = await request(t.app).get('/ack/not-a-token')
    expect(res.headers['cache-control']).toBe('no-store')
  })

  test('a photo may be kept by the signed-in person’s own browser only', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const task = await makeTankTask(tanks[0])
    const png = Buffer.concat([Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]), Buffer.alloc(64)])
    const uploaded = await manager.post(`/api/tasks/${task.id}/photos`).attach('photo', png, { filename: 'gill.png', contentType: 'image/png' }).expect(201)
    const res = await manager.get(`/api/photos/${uploaded.body.id}`).expect(200)
    expect(res.headers['cache-control']).toBe('private, max-age=86400')
  })
})
