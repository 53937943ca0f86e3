import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import type request from 'supertest'
import { ensureFacilityAndParameters, makeAreaWithTanks, uniqueCode } from '#tests/support/facility-fixtures'
import { startTestApp, type TestApp } from '#tests/support/test-app'

let t: TestApp
let manager: request.Agent
let technician: request.Agent
beforeAll(async () => {
  t = await startTestApp()
  await ensureFacilityAndParameters()
  manager = (await t.signedInAgent('manager')).agent
  technician = (await t.signedInAgent('technician')).agent
})
afterAll(() => t.close())

describe('facility catalogues', () => {
  test('when a manager creates, edits and deletes an area, then each change reads back', async () => {
    const code = uniqueCode('AR')
    const { body: area } = await manager.post('/api/areas').send({ code, name: 'Hatchery', roundOrder: 5, quarantine: false }).expect(201)
    await manager.patch(`/api/areas/${area.id}`).send({ name: 'Hatchery Hall' }).expect(200)
    expect((await manager.get(`/api/areas/${area.id}`).expect(200)).body.name).toBe('Hatchery Hall')
    await manager.delete(`/api/areas/${area.id}`).expect(204)
    await manager.get(`/api/areas/${area.id}`).expect(404)
  })

  test('when a technician tries to add a tank, then it is refused with 403 but they can still read tanks', async () => {
    const { area } = await makeAreaWithTanks(0)
    await technician
      .post('/api/tanks')
      .send({ code: uniqueCode('T'), name: 'X', areaId: area.id, systemId: null, volumeL: 100, kind: 'tank', inUse: true })
      .expect(403)
    await technician.get('/api/tanks').expect(200)
  })

  test('when a tank code is taken, then it answers 409', async () => {
    const { area, tanks } = await makeAreaWithTanks(1)
    const res = await manager
      .post('/api/tanks')
      .send({ code: tanks[0].code, name: 'Again', areaId: area.id, systemId: null, volumeL: 100, kind: 'tank', inUse: true })
      .expect(409)
    expect(res.body.error.message).toContain(tanks[0].code)
  })

  test('when the volume is negative, then it answers 400 naming volumeL', async () => {
    const { area } = await makeAreaWithTanks(0)
    const res = await manager
      .post('/api/tanks')
      .send({ code: uniqueCode('T'), name: 'Bad', areaId: area.id, systemId: null, volumeL: -5, kind: 'tank', inUse: true })
      .expect(400)
    expect(res.body.error.fieldErrors).toHaveProperty('volumeL')
  })

  test('when a manager changes the facility time zone to a made-up one, then it is refused', async () => {
    const res = await manager.patch('/api/facility').send({ timeZone: 'Mars/Olympus' }).expect(400)
    expect(res.body.error.fieldErrors).toHaveProperty('timeZone')
    await technician.patch('/api/facility').send({ name: 'Nope' }).expect(403)
  })
})

describe('references between catalogues', () => {
  test('a tank in an area that does not exist is refused; an area that still holds tanks cannot be deleted', async () => {
    const res = await manager
      .post('/api/tanks')
      .send({ code: uniqueCode('T'), name: 'Orphan', areaId: 987654, systemId: null, volumeL: 100, kind: 'tank', inUse: true })
      .expect(400)
    expect(res.body.error.fieldErrors).toHaveProperty('areaId')
    const { area } = await makeAreaWithTanks(1)
    const refused = await manager.delete(`/api/areas/${area.id}`).expect(409)
    expect(refused.body.error.message).toMatch(/still holds 1 tank/)
  })
})

describe('POST /api/tanks/import', () => {
  const csv = (lines: string[]) => Buffer.from(['code,name,area,system,volume_l,kind,in_use', ...lines].join('\n'))

  test('when the file is good, then tanks are created, and the same file again changes nothing', async () => {
    const { area, system } = await makeAreaWithTanks(0)
    const a = uniqueCode('CSV')
    const b = uniqueCode('CSV')
    const file = csv([`${a},Grow-out 1,${area.code},${system.code},1200,tank,yes`, `"${b}","Bin, spare",${area.code},,250,bin,no`])
    const first = await manager.post('/api/tanks/import').attach('file', file, 'tanks.csv').expect(200)
    expect(first.body).toEqual({ created: 2, updated: 0, unchanged: 0 })
    const again = await manager.post('/api/tanks/import').attach('file', file, 'tanks.csv').expect(200)
    expect(again.body).toEqual({ created: 0, updated: 0, unchanged: 2 })
    const all = (await manager.get('/api/tanks').expect(200)).body as Array<{ code: string; name: string; inUse: boolean }>
    expect(all.find((x) => x.code === b)).toMatchObject({ name: 'Bin, spare', inUse: false })
  })

  test('when one line is malformed, then nothing from the file is imported and the error names the line', async () => {
    const { area } = await makeAreaWithTanks(0)
    const good = uniqueCode('CSV')
    const file = csv([
      `${good},Fine,${area.code},,500,tank,yes`,
      `${uniqueCode('CSV')},Broken,${area.code},,-3,tank,maybe`,
      `${uniqueCode('CSV')},Lost,NO-SUCH-AREA,,100,tank,yes`,
    ])
    const res = await manager.post('/api/tanks/import').attach('file', file, 'tanks.csv').expect(400)
    const lines = res.body.error.fieldErrors.file as string[]
    expect(lines.some((l) => l.startsWith('Line 3:') && l.includes('in_use'))).toBe(true)
    expect(lines.some((l) => l.startsWith('Line 3:') && l.includes('volume_l'))).toBe(true)
    expect(lines.some((l) => l.startsWith('Line 4:') && l.includes('NO-SUCH-AREA'))).toBe(true)
    const all = (await manager.get('/api/tanks').expect(200)).body as Array<{ code: string }>
    expect(all.map((x) => x.code)).not.toContain(good)
  })

  test('when the header is missing columns, then it says which', async () => {
    const res = await manager.post('/api/tanks/import').attach('file', Buffer.from('code,name\nA,B'), 'tanks.csv').expect(400)
    expect(res.body.error.message).toMatch(/Missing: area, system, volume_l, kind, in_use/)
  })

  test('when the upload is not a CSV, then it answers 415', async () => {
    await manager.post('/api/tanks/import').attach('file', Buffer.from('\x89PNG'), { filename: 'tank.png', contentType: 'image/png' }).expect(415)
  })

  test('when a technician uploads tanks, then it is refused', async () => {
    await technician.post('/api/tanks/import').attach('file', csv([]), 'tanks.csv').expect(403)
  })
})
