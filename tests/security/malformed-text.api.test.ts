import request from 'supertest'
import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { buildPersonInput } from '#seed/factories'
import { ensureFacilityAndParameters, makeAreaWithTanks, routineInput, uniqueCode } from '#tests/support/facility-fixtures'
import { completion, makeTankTask } from '#tests/support/task-fixtures'
import { startTestApp, type TestApp } from '#tests/support/test-app'

let t: TestApp
let manager: request.Agent
beforeAll(async () => {
  t = await startTestApp()
  await ensureFacilityAndParameters()
  manager = (await t.signedInAgent('manager')).agent
})
afterAll(() => t.close())

// Half of a UTF-16 pair on its own: valid in JSON ("\ud800"), but not text. MariaDB refuses it.
const LONE_HIGH = '\ud800'
const LONE_LOW = 'Tank \udc00 north'

describe('malformed Unicode in a text field is a 400, never a 500', () => {
  test('a person named with a lone surrogate is refused on the name field and not stored', async () => {
    const input = buildPersonInput({ name: LONE_HIGH })
    const res = await manager.post('/api/people').send(input).expect(400)
    expect(res.body.error.fieldErrors.name).toEqual(['Contains a broken character; type it again'])
    const people = (await manager.get('/api/people').expect(200)).body as Array<{ email: string }>
    expect(people.some((p) => p.email === input.email)).toBe(false)
  })

  test('renaming a person, a routine, an area and writing a note refuse it alike', async () => {
    const person = await t.createPersonWithRole('technician')
    const { area, tanks } = await makeAreaWithTanks(1)
    const task = await makeTankTask(tanks[0])
    const answers = [
      await manager.patch(`/api/people/${person.id}`).send({ title: LONE_LOW }),
      await manager.post('/api/routines').send(routineInput({ name: `Check ${LONE_HIGH}`, targetIds: [tanks[0].id] })),
      await manager.patch(`/api/areas/${area.id}`).send({ name: LONE_LOW }),
      await manager.post('/api/on-call/notes').send({ text: LONE_HIGH }),
      await manager.post(`/api/tasks/${task.id}/completion`).send(completion({ do_mgL: 7, temp_c: 27 }, { note: LONE_LOW })),
      await manager.post('/api/areas').send({ code: uniqueCode('A'), name: 'Hall', roundOrder: 1, quarantine: false, [LONE_HIGH]: 1 }),
    ]
    expect(answers.slice(0, 5).map((r) => r.status)).toEqual([400, 400, 400, 400, 400])
    for (const res of answers.slice(0, 5)) expect(JSON.stringify(res.body.error.fieldErrors)).toContain('broken character')
    // An unknown key is dropped, whatever it is made of; the area itself is fine.
    expect(answers[5].status).toBe(201)
  })

  test('a well-formed pair (an emoji) and letters beyond ASCII are ordinary text and are kept', async () => {
    const input = buildPersonInput({ name: 'Ørjan Ní Bhriain 🐟' })
    const res = await manager.post('/api/people').send(input).expect(201)
    expect(res.body.name).toBe('Ørjan Ní Bhriain 🐟')
  })
})
