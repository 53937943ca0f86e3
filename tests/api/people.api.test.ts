import request from 'supertest'
import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { buildPersonInput } from '#seed/factories'
import { startTestApp, type TestApp } from '#tests/support/test-app'

let t: TestApp
beforeAll(async () => {
  t = await startTestApp()
})
afterAll(() => t.close())

describe('/api/people', () => {
  test('when a manager adds a person, then that person can sign in with the first password', async () => {
    const { agent } = await t.signedInAgent('manager')
    const input = buildPersonInput({ role: 'observer' })
    const created = await agent.post('/api/people').send(input).expect(201)
    expect(created.body).toMatchObject({ email: input.email, role: 'observer', active: true })
    const list = await agent.get('/api/people').expect(200)
    expect(list.body.map((p: { email: string }) => p.email)).toContain(input.email)
    await request(t.app).post('/api/session').send({ email: input.email, password: input.password }).expect(200)
  })

  test('when the e-mail is already taken, then it answers 409 and adds nobody', async () => {
    const { agent } = await t.signedInAgent('manager')
    const input = buildPersonInput()
    await agent.post('/api/people').send(input).expect(201)
    const res = await agent
      .post('/api/people')
      .send({ ...input, name: 'Someone else' })
      .expect(409)
    expect(res.body.error.message).toContain(input.email)
  })

  test('when the password is too short, then it answers 400 naming the password field', async () => {
    const { agent } = await t.signedInAgent('manager')
    const res = await agent
      .post('/api/people')
      .send(buildPersonInput({ password: 'short' }))
      .expect(400)
    expect(res.body.error.fieldErrors).toHaveProperty('password')
  })

  test('when a manager changes a role, then the person signs in with the new role', async () => {
    const { agent } = await t.signedInAgent('manager')
    const input = buildPersonInput({ role: 'technician' })
    const { body: person } = await agent.post('/api/people').send(input).expect(201)
    await agent.patch(`/api/people/${person.id}`).send({ role: 'supervisor' }).expect(200)
    const res = await request(t.app).post('/api/session').send({ email: input.email, password: input.password }).expect(200)
    expect(res.body.role).toBe('supervisor')
  })

  test('when a manager resets a password, then the old one stops working and the new one works', async () => {
    const { agent } = await t.signedInAgent('manager')
    const input = buildPersonInput()
    const { body: person } = await agent.post('/api/people').send(input).expect(201)
    await agent.post(`/api/people/${person.id}/password`).send({ password: 'a-brand-new-pass' }).expect(200)
    await request(t.app).post('/api/session').send({ email: input.email, password: input.password }).expect(401)
    await request(t.app).post('/api/session').send({ email: input.email, password: 'a-brand-new-pass' }).expect(200)
  })

  test('when a manager tries to deactivate themselves, then it is refused', async () => {
    const { agent, person } = await t.signedInAgent('manager')
    const res = await agent.patch(`/api/people/${person.id}`).send({ active: false }).expect(403)
    expect(res.body.error.message).toMatch(/cannot deactivate yourself/)
  })

  test('when the person id does not exist, then it answers 404', async () => {
    const { agent } = await t.signedInAgent('manager')
    await agent.patch('/api/people/987654').send({ name: 'Ghost' }).expect(404)
  })
})

describe('GET /api/health', () => {
  test('when the database is up, then it answers 200 with the database status', async () => {
    const res = await request(t.app).get('/api/health').expect(200)
    expect(res.body).toMatchObject({ status: 'ok', database: 'up' })
  })
})

describe('errors', () => {
  test('when an API route does not exist, then it answers 404 in the error format', async () => {
    const { agent } = await t.signedInAgent('technician')
    const res = await agent.get('/api/no-such-thing').expect(404)
    expect(res.body.error.code).toBe('not_found')
  })
})
