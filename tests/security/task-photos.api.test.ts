import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { ensureFacilityAndParameters, makeAreaWithTanks } from '#tests/support/facility-fixtures'
import { completion, makeTankTask } from '#tests/support/task-fixtures'
import { startTestApp, type TestApp } from '#tests/support/test-app'

let t: TestApp
beforeAll(async () => {
  t = await startTestApp()
  await ensureFacilityAndParameters()
})
afterAll(() => t.close())

const png = Buffer.concat([Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]), Buffer.alloc(64)])
const attach = (agent: TestAgent, taskId: number) =>
  agent.post(`/api/tasks/${taskId}/photos`).attach('photo', png, { filename: 'tank.png', contentType: 'image/png' })
type TestAgent = Awaited<ReturnType<TestApp['signedInAgent']>>['agent']

async function photoCount(agent: TestAgent, taskId: number) {
  return ((await agent.get(`/api/tasks/${taskId}/photos`).expect(200)).body as unknown[]).length
}

describe('a photo joins a task’s record on the same terms as completing it', () => {
  test('a technician cannot add a photo to an open task assigned to someone else; the assignee and a supervisor can', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const owner = await t.signedInAgent('technician')
    const task = await makeTankTask(tanks[0], { assigneeId: owner.person.id })
    const other = await t.signedInAgent('technician')
    const refused = await attach(other.agent, task.id).expect(403)
    expect(refused.body.error.message).toMatch(/assigned to someone else/)
    expect(await photoCount(owner.agent, task.id)).toBe(0)
    await attach(owner.agent, task.id).expect(201)
    await attach((await t.signedInAgent('supervisor')).agent, task.id).expect(201)
    expect(await photoCount(owner.agent, task.id)).toBe(2)
  })

  test('once a task is done, only the person who did it, a supervisor or a manager can add a photo', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const task = await makeTankTask(tanks[0])
    const doer = await t.signedInAgent('technician')
    await doer.agent
      .post(`/api/tasks/${task.id}/completion`)
      .send(completion({ do_mgL: 7.1, temp_c: 27 }))
      .expect(200)
    // The task was unassigned: a bystander could have taken it while open, but not now it is closed.
    const bystander = await t.signedInAgent('technician')
    await attach(bystander.agent, task.id).expect(403)
    await attach(doer.agent, task.id).expect(201)
    await attach((await t.signedInAgent('manager')).agent, task.id).expect(201)
    expect(await photoCount(doer.agent, task.id)).toBe(2)
  })

  test('a task on hold takes no photo from a technician, as it takes no completion', async () => {
    const { tanks } = await makeAreaWithTanks(1)
    const task = await makeTankTask(tanks[0], { status: 'held', heldReason: 'fasting before grading' })
    const tech = await t.signedInAgent('technician')
    await attach(tech.agent, task.id).expect(403)
    expect(await photoCount(tech.agent, task.id)).toBe(0)
  })
})
