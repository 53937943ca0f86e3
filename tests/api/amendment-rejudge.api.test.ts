import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import type request from 'supertest'
import { db } from '#server/db/data-source'
import { AmendmentEntity } from '#server/modules/completions/amendment.entity'
import { AlertEntity, ReadingEntity } from '#server/modules/completions/completion.entities'
import { TaskEntity } from '#server/modules/tasks/task.entity'
import type { Tank } from '#shared/schemas/facility'
import { ensureFacilityAndParameters, makeAreaWithTanks } from '#tests/support/facility-fixtures'
import { failingInsert } from '#tests/support/failing-insert'
import { completion, makeTankTask, setSystemLimit } from '#tests/support/task-fixtures'
import { startTestApp, type TestApp } from '#tests/support/test-app'

let t: TestApp
let supervisor: request.Agent
beforeAll(async () => {
  t = await startTestApp()
  await ensureFacilityAndParameters()
  supervisor = (await t.signedInAgent('supervisor')).agent
})
afterAll(() => t.close())

const taskRow = (id: number) => db().getRepository(TaskEntity).findOneByOrFail({ id })
const criticalAlerts = (taskId: number) =>
  db()
    .getRepository(AlertEntity)
    .find({ where: { taskId, kind: 'critical_reading' } })
const rechecks = (taskId: number) =>
  db()
    .getRepository(TaskEntity)
    .find({ where: { recheckOfTaskId: taskId } })
const amend = (completionId: string, do_mgL: number, reason: string) =>
  supervisor.post(`/api/completions/${completionId}/amendments`).send({ reason, readings: { do_mgL } })

/** A tank whose loop has its own DO limits, so the story does not hang on the facility's defaults: ok 5–10.5 mg/L, critical below 4. */
async function tankWithDoLimits(): Promise<Tank> {
  const { system, tanks } = await makeAreaWithTanks(1)
  await setSystemLimit(system.id, 'do_mgL', { okMin: 5, okMax: 10.5, criticalMin: 4, criticalMax: null })
  return tanks[0]
}

async function completedCheck(doMgL: number) {
  const task = await makeTankTask(await tankWithDoLimits())
  const tech = await t.signedInAgent('technician')
  const body = completion({ do_mgL: doMgL, temp_c: 28 })
  await tech.agent.post(`/api/tasks/${task.id}/completion`).send(body).expect(200)
  return { task, tech: tech.person, completionId: body.completionId }
}

describe('a supervisor corrects a reading on a finished check, and the record is judged again', () => {
  test('a normal DO corrected to a critical one flags the task critical and raises the alert and the recheck once, however often it is amended', async () => {
    const { task, tech, completionId } = await completedCheck(6.8)
    expect((await taskRow(task.id)).flag).toBeNull()
    expect(await criticalAlerts(task.id)).toHaveLength(0)

    await amend(completionId, 3.1, 'The meter was read on the wrong probe; the tank read 3.1').expect(201)
    expect((await taskRow(task.id)).flag).toBe('critical')
    const [alert] = await criticalAlerts(task.id)
    expect(alert).toMatchObject({ closedAt: null })
    expect(alert.detail).toContain('do_mgL 3.1')
    const [recheck] = await rechecks(task.id)
    // The recheck goes to whoever did the check, at welfare-critical priority, as after a critical completion.
    expect(recheck).toMatchObject({ assigneeId: tech.id, priority: 'welfare_critical', status: 'open' })

    await amend(completionId, 3.0, 'Second look at the logger: 3.0, not 3.1').expect(201)
    expect((await taskRow(task.id)).flag).toBe('critical')
    expect(await criticalAlerts(task.id)).toHaveLength(1)
    expect(await rechecks(task.id)).toHaveLength(1)

    // The corrected readings are banded again, the derived saturation with them.
    const live = (await db().getRepository(ReadingEntity).find({ where: { completionId } })).filter((r) => r.supersededAt === null)
    expect(live.find((r) => r.parameterKey === 'do_mgL')).toMatchObject({ value: 3, band: 'critical' })
    expect(live.filter((r) => r.parameterKey === 'do_pct')).toHaveLength(1)
  })

  test('a critical DO corrected back to normal clears the flag and closes the alert; made critical again, the same alert starts again', async () => {
    const { task, completionId } = await completedCheck(3.1)
    expect((await taskRow(task.id)).flag).toBe('critical')
    expect(await criticalAlerts(task.id)).toHaveLength(1)

    await amend(completionId, 6.9, 'Typed 3.1 for 6.9; the meter display read 6.9').expect(201)
    const cleared = await taskRow(task.id)
    expect(cleared.flag).toBeNull()
    const [closed] = await criticalAlerts(task.id)
    expect(closed.closedAt).not.toBeNull()

    await amend(completionId, 4.5, 'The logger shows 4.5 at the time of the check').expect(201)
    expect((await taskRow(task.id)).flag).toBe('watch')
    expect((await criticalAlerts(task.id))[0].closedAt).not.toBeNull()

    await amend(completionId, 3.2, 'Calibration check: the probe read high; 3.2 is right').expect(201)
    expect((await taskRow(task.id)).flag).toBe('critical')
    const alerts = await criticalAlerts(task.id)
    expect(alerts).toHaveLength(1)
    expect(alerts[0]).toMatchObject({ closedAt: null, acknowledgedAt: null })
    expect(alerts[0].detail).toContain('do_mgL 3.2')
    // The recheck raised by the critical completion is the only one.
    expect(await rechecks(task.id)).toHaveLength(1)
  })

  test('an impossible corrected value is refused with the field named, and nothing is re-judged', async () => {
    const { task, completionId } = await completedCheck(6.8)
    const res = await amend(completionId, 31, 'Typed the temperature into the DO field').expect(400)
    expect(res.body.error.message).toBe('Nothing was saved: check the corrected readings.')
    expect(res.body.error.fieldErrors['readings.do_mgL'][0]).toMatch(/impossible/)
    expect((await taskRow(task.id)).flag).toBeNull()
    expect(await criticalAlerts(task.id)).toHaveLength(0)
  })

  test('when the alert cannot be written, the correction is not kept either: one commit holds the amendment, the new flag and its follow-ups', async () => {
    const { task, completionId } = await completedCheck(6.8)
    await failingInsert('alerts', `NEW.taskId = ${task.id}`, () =>
      amend(completionId, 3.1, 'The meter was read on the wrong probe; the tank read 3.1').expect(500),
    )
    expect((await taskRow(task.id)).flag).toBeNull()
    expect(await db().getRepository(AmendmentEntity).countBy({ completionId })).toBe(0)
    expect(await rechecks(task.id)).toHaveLength(0)
    const readings = await db().getRepository(ReadingEntity).find({ where: { completionId } })
    expect(readings.every((r) => r.supersededAt === null && r.amendmentId === null)).toBe(true)
  })
})
