import request from 'supertest'
import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { buildPersonInput, TEST_PASSWORD } from '#seed/factories'
import { ensureFacilityAndParameters, uniqueCode } from '#tests/support/facility-fixtures'
import { startTestApp, type TestApp } from '#tests/support/test-app'

let t: TestApp
beforeAll(async () => {
  t = await startTestApp({ signInLimitPerAccount: 4 })
  await ensureFacilityAndParameters()
})
afterAll(() => t.close())

const freshAddress = () => `${uniqueCode('moved')}@brackenwater.example`.toLowerCase()
const savedEmail = async (agent: request.Agent) => (await agent.get('/api/me/preferences').expect(200)).body.email as string

describe('changing the address one signs in with', () => {
  test('without the current password it is refused with 400 on that field, and the address stays', async () => {
    const { agent, person } = await t.signedInAgent('technician')
    const res = await agent.patch('/api/me/preferences').send({ email: freshAddress() }).expect(400)
    expect(res.body.error.fieldErrors.currentPassword).toEqual(['Enter your current password'])
    expect(await savedEmail(agent)).toBe(person.email)
  })

  test('with a wrong current password it is refused, and the address stays', async () => {
    const { agent, person } = await t.signedInAgent('supervisor')
    const res = await agent.patch('/api/me/preferences').send({ email: freshAddress(), currentPassword: 'not-the-password' }).expect(400)
    expect(res.body.error.fieldErrors.currentPassword).toEqual(['Not your current password'])
    expect(await savedEmail(agent)).toBe(person.email)
  })

  test('with the current password the new address is saved and is the one to sign in with', async () => {
    const { agent } = await t.signedInAgent('technician')
    const moved = freshAddress()
    await agent.patch('/api/me/preferences').send({ email: moved, currentPassword: TEST_PASSWORD }).expect(200)
    expect(await savedEmail(agent)).toBe(moved)
    await request(t.app).post('/api/session').send({ email: moved, password: TEST_PASSWORD }).expect(200)
  })

  test('an address someone else has answers 409 with a plain message, and only after the password is right', async () => {
    const { agent, person } = await t.signedInAgent('technician')
    const taken = (await t.createPersonWithRole('manager')).email
    // Without the password nothing is said about the address, so the form is no account probe.
    const probe = await agent.patch('/api/me/preferences').send({ email: taken }).expect(400)
    expect(JSON.stringify(probe.body)).not.toMatch(/in use/)
    const res = await agent.patch('/api/me/preferences').send({ email: taken, currentPassword: TEST_PASSWORD }).expect(409)
    expect(res.body.error).toMatchObject({
      code: 'conflict',
      message: 'That e-mail address is already in use. Choose another and try again.',
      fieldErrors: { email: ['Already in use'] },
    })
    expect(await savedEmail(agent)).toBe(person.email)
  })

  test('quiet hours alone need no password', async () => {
    const { agent } = await t.signedInAgent('technician')
    const res = await agent.patch('/api/me/preferences').send({ quietStart: '22:00', quietEnd: '06:00' }).expect(200)
    expect(res.body).toMatchObject({ quietStart: '22:00', quietEnd: '06:00' })
  })

  test('wrong current passwords are limited like sign-ins, so an open session cannot be used to guess the password', async () => {
    const { agent, person } = await t.signedInAgent('technician')
    const statuses: number[] = []
    for (let i = 0; i < 6; i++)
      statuses.push((await agent.patch('/api/me/preferences').send({ email: freshAddress(), currentPassword: `guess-number-${i}` })).status)
    expect(statuses.slice(0, 4)).toEqual([400, 400, 400, 400])
    expect(statuses.slice(4)).toEqual([429, 429])
    // Even the right password waits out the window now.
    await agent.patch('/api/me/preferences').send({ email: freshAddress(), currentPassword: TEST_PASSWORD }).expect(429)
    expect(await savedEmail(agent)).toBe(person.email)
  })
})

describe('a unique value claimed twice at once is a 409, never a 500', () => {
  test('two managers adding a person with the same address at the same moment: one is created, the other told plainly', async () => {
    const manager = (await t.signedInAgent('manager')).agent
    const input = buildPersonInput({ role: 'technician' })
    const statuses = (await Promise.all([1, 2, 3].map(() => manager.post('/api/people').send(input)))).map((r) => r.status).sort()
    expect(statuses).toEqual([201, 409, 409])
  })

  test('two areas with the same code sent at once: one is created, the other answers 409 naming the code', async () => {
    const manager = (await t.signedInAgent('manager')).agent
    const area = { code: uniqueCode('HALL'), name: 'Grow-out hall', roundOrder: 1, quarantine: false }
    const answers = await Promise.all([1, 2, 3].map(() => manager.post('/api/areas').send(area)))
    expect(answers.map((r) => r.status).sort()).toEqual([201, 409, 409])
    for (const refused of answers.filter((r) => r.status === 409)) expect(refused.body.error.message).toMatch(/code/)
  })
})
