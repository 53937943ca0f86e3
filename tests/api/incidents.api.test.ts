import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { In } from 'typeorm'
import { db } from '#server/db/data-source'
import { advanceTaskStatuses } from '#server/jobs/status-clock'
import { AlertEntity } from '#server/modules/completions/completion.entities'
import { runEscalations } from '#server/modules/escalation/escalate'
import { NotificationEntity } from '#server/modules/escalation/escalation.entities'
import { escalateOverdueIncidents } from '#server/modules/incidents/incidents.service'
import type { Incident } from '#shared/schemas/incident'
import { ensureFacilityAndParameters, makeAreaWithTanks, uniqueCode } from '#tests/support/facility-fixtures'
import { makeTankTask } from '#tests/support/task-fixtures'
import { startTestApp, type TestApp } from '#tests/support/test-app'

let t: TestApp
beforeAll(async () => {
  t = await startTestApp({}, { ownDatabase: true })
  await ensureFacilityAndParameters()
})
afterAll(() => t.close())

const MIN = 60_000
const HOUR = 60 * MIN

/** A welfare-critical check that passes its grace at `missedAt` while the clock runs. */
async function missWelfareCriticalCheck(missedAt: Date) {
  const { tanks } = await makeAreaWithTanks(1)
  const assignee = await t.createPersonWithRole('technician')
  const due = new Date(missedAt.getTime() - 60 * MIN)
  const task = await makeTankTask(tanks[0], {
    title: `Morning tank check ${uniqueCode('i')}`,
    assigneeId: assignee.id,
    dueAt: due,
    windowStartAt: new Date(due.getTime() - 30 * MIN),
    graceUntil: missedAt,
    status: 'overdue',
    localStart: '2032-01-01T07:30:00',
  })
  await advanceTaskStatuses(db(), new Date(missedAt.getTime() + 1000))
  return { task, tank: tanks[0] }
}

type Agent = Awaited<ReturnType<TestApp['signedInAgent']>>['agent']
const signInAs = async (role: 'supervisor' | 'observer') => (await t.signedInAgent(role)).agent

async function incidentsOf(taskId: number, as: Agent) {
  const res = await as.get('/api/incidents').expect(200)
  return (res.body as Incident[]).filter((i) => i.taskId === taskId)
}

describe('incidents proposed by Roundtide, decided by a person', () => {
  test('when a welfare-critical check is missed, then one incident is proposed (not filed), with deadlines 24 h / 72 h / 7 d from when it was noticed', async () => {
    const missedAt = new Date(Date.now() + 9000 * MIN)
    const { task, tank } = await missWelfareCriticalCheck(missedAt)
    // The clock runs again (a retried tick, a second process): still one proposal.
    await advanceTaskStatuses(db(), new Date(missedAt.getTime() + 60_000))
    const supervisor = await signInAs('supervisor')
    const found = await incidentsOf(task.id, supervisor)
    expect(found).toHaveLength(1)
    const [incident] = found
    expect(incident.status).toBe('proposed')
    expect(incident.source).toBe('missed_task')
    expect(incident.tankIds).toEqual([tank.id])
    const noticed = new Date(incident.noticedAt).getTime()
    expect(new Date(incident.welfareDueAt).getTime() - noticed).toBe(24 * HOUR)
    expect(new Date(incident.committeeDueAt).getTime() - noticed).toBe(72 * HOUR)
    expect(new Date(incident.reportDueAt).getTime() - noticed).toBe(7 * 24 * HOUR)
  })

  test('when the facility sets its own hours, then a proposal’s three deadlines follow them', async () => {
    const manager = (await t.signedInAgent('manager')).agent
    await manager.patch('/api/stock/settings').send({ notifyWelfareOfficerHours: 12, notifyCommitteeHours: 48, fullReportHours: 120 }).expect(200)
    try {
      const { task } = await missWelfareCriticalCheck(new Date(Date.now() + 9050 * MIN))
      const [incident] = await incidentsOf(task.id, await signInAs('supervisor'))
      const noticed = new Date(incident.noticedAt).getTime()
      expect(new Date(incident.welfareDueAt).getTime() - noticed).toBe(12 * HOUR)
      expect(new Date(incident.committeeDueAt).getTime() - noticed).toBe(48 * HOUR)
      expect(new Date(incident.reportDueAt).getTime() - noticed).toBe(120 * HOUR)
    } finally {
      // Back to the defaults the other stories in this file count on.
      await manager.patch('/api/stock/settings').send({ notifyWelfareOfficerHours: 24, notifyCommitteeHours: 72, fullReportHours: 168 }).expect(200)
    }
  })

  test('a proposal is confirmed or dismissed only with a reason; an observer may add a note but not confirm', async () => {
    const { task } = await missWelfareCriticalCheck(new Date(Date.now() + 9100 * MIN))
    const supervisor = await signInAs('supervisor')
    const observer = await signInAs('observer')
    const [incident] = await incidentsOf(task.id, supervisor)
    await observer.post(`/api/incidents/${incident.id}/confirm`).send({ reason: 'Seen it' }).expect(403)
    const noReason = await supervisor.post(`/api/incidents/${incident.id}/confirm`).send({ reason: '' }).expect(400)
    expect(JSON.stringify(noReason.body)).toContain('Say why')
    const confirmed = await supervisor.post(`/api/incidents/${incident.id}/confirm`).send({ reason: 'Fish in the tank were gasping at 10:00' }).expect(200)
    expect(confirmed.body.status).toBe('open')
    expect(confirmed.body.decisionReason).toBe('Fish in the tank were gasping at 10:00')
    await supervisor.post(`/api/incidents/${incident.id}/dismiss`).send({ reason: 'Changed my mind' }).expect(409)
    const noted = await observer.post(`/api/incidents/${incident.id}/notes`).send({ text: 'Welfare officer informed by phone.' }).expect(201)
    expect(noted.body.notes.map((n: { text: string }) => n.text)).toEqual(['Welfare officer informed by phone.'])
    const reported = await supervisor.patch(`/api/incidents/${incident.id}`).send({ rootCause: 'Aerator tripped', status: 'reported' }).expect(200)
    expect(reported.body.status).toBe('reported')
    expect(reported.body.reportedAt).not.toBeNull()
  })

  test('when a proposal that already escalated its 24 h deadline is dismissed with a reason, then its alert stops and nothing escalates after', async () => {
    const { task } = await missWelfareCriticalCheck(new Date(Date.now() + 9150 * MIN))
    const supervisor = await signInAs('supervisor')
    const [incident] = await incidentsOf(task.id, supervisor)
    const welfareAlerts = () => db().getRepository(AlertEntity).findBy({ taskId: task.id, kind: 'incident_welfare_overdue' })
    const welfareLate = new Date(new Date(incident.welfareDueAt).getTime() + MIN)
    await escalateOverdueIncidents(welfareLate)
    expect((await welfareAlerts()).map((a) => a.closedAt)).toEqual([null])

    await supervisor.post(`/api/incidents/${incident.id}/dismiss`).send({ reason: '' }).expect(400)
    const dismissed = (
      await supervisor.post(`/api/incidents/${incident.id}/dismiss`).send({ reason: 'The check was done on paper; the sheet was typed in late' }).expect(200)
    ).body as Incident
    expect(dismissed).toMatchObject({ status: 'dismissed', decisionReason: 'The check was done on paper; the sheet was typed in late' })
    // No deadline is needed any more, so the ladder stops calling people about it.
    expect((await welfareAlerts())[0].closedAt).not.toBeNull()
    await escalateOverdueIncidents(new Date(new Date(incident.reportDueAt).getTime() + HOUR))
    const later = await db()
      .getRepository(AlertEntity)
      .findBy({ taskId: task.id, kind: In(['incident_overdue', 'incident_report_overdue']) })
    expect(later).toEqual([])
    await supervisor.post(`/api/incidents/${incident.id}/confirm`).send({ reason: 'Changed my mind' }).expect(409)
  })

  test('when a confirmed incident passes its 72 h committee deadline unreported, then it escalates through the ladder once', async () => {
    const missedAt = new Date(Date.now() + 9200 * MIN)
    const { task } = await missWelfareCriticalCheck(missedAt)
    const supervisor = await signInAs('supervisor')
    const [incident] = await incidentsOf(task.id, supervisor)
    await supervisor.post(`/api/incidents/${incident.id}/confirm`).send({ reason: 'Check was missed on a hot day' }).expect(200)
    const committeeDue = new Date(incident.committeeDueAt).getTime()

    await escalateOverdueIncidents(new Date(committeeDue - 60_000))
    expect(await db().getRepository(AlertEntity).findBy({ taskId: task.id, kind: 'incident_overdue' })).toHaveLength(0)

    const past = new Date(committeeDue + 60 * MIN)
    await escalateOverdueIncidents(past)
    await escalateOverdueIncidents(new Date(past.getTime() + 30 * MIN))
    const alerts = await db().getRepository(AlertEntity).findBy({ taskId: task.id, kind: 'incident_overdue' })
    expect(alerts).toHaveLength(1)
    await runEscalations(past)
    await runEscalations(past)
    const firstStep = await db().getRepository(NotificationEntity).findBy({ alertId: alerts[0].id, step: 0 })
    expect(firstStep.length).toBeGreaterThan(0)
    expect(new Set(firstStep.map((n) => n.personId)).size).toBe(firstStep.length)
    const after = (await supervisor.get(`/api/incidents/${incident.id}`).expect(200)).body as Incident
    expect(after.escalatedAt).toBe(past.toISOString())
  })

  test('each deadline escalates once on its own: the welfare officer at 24 h even before a decision, the full report at 7 days; a deadline met stops its alert', async () => {
    const { task } = await missWelfareCriticalCheck(new Date(Date.now() + 9300 * MIN))
    const supervisor = await signInAs('supervisor')
    const [incident] = await incidentsOf(task.id, supervisor)
    const alertsOf = async (kind: string) =>
      db()
        .getRepository(AlertEntity)
        .findBy({ taskId: task.id, kind: kind as never })
    const welfareLate = new Date(new Date(incident.welfareDueAt).getTime() + MIN)
    // Other files' incidents may be due at the same ticks, so only this incident's alerts are counted.
    await escalateOverdueIncidents(welfareLate)
    await escalateOverdueIncidents(new Date(welfareLate.getTime() + 10 * MIN))
    expect(await alertsOf('incident_welfare_overdue')).toHaveLength(1)
    expect(((await supervisor.get(`/api/incidents/${incident.id}`)).body as Incident).welfareEscalatedAt).toBe(welfareLate.toISOString())
    // Still only proposed: the committee deadline waits for a confirmed incident.
    expect(await alertsOf('incident_overdue')).toHaveLength(0)

    await supervisor.post(`/api/incidents/${incident.id}/confirm`).send({ reason: 'Tank was not checked all morning' }).expect(200)
    const told = await supervisor
      .patch(`/api/incidents/${incident.id}`)
      .send({ welfareNotifiedAt: new Date(welfareLate.getTime() + 5 * MIN).toISOString() })
      .expect(200)
    expect(told.body.welfareNotifiedAt).not.toBeNull()
    expect((await alertsOf('incident_welfare_overdue'))[0].closedAt).not.toBeNull()

    const reportLate = new Date(new Date(incident.reportDueAt).getTime() + MIN)
    await escalateOverdueIncidents(reportLate) // the committee and the full report, both unmet
    await escalateOverdueIncidents(new Date(reportLate.getTime() + HOUR))
    expect(await alertsOf('incident_overdue')).toHaveLength(1)
    expect(await alertsOf('incident_report_overdue')).toHaveLength(1)
    const unfinished = await supervisor.patch(`/api/incidents/${incident.id}`).send({ rootCause: 'Shift swap not recorded', status: 'closed' }).expect(400)
    expect(unfinished.body.error.fieldErrors).toHaveProperty(['correctiveActions'])
    expect(((await supervisor.get(`/api/incidents/${incident.id}`)).body as Incident).status).toBe('open')
    const closed = (
      await supervisor
        .patch(`/api/incidents/${incident.id}`)
        .send({ rootCause: 'Shift swap not recorded', correctiveActions: 'Swaps go through the roster page', status: 'closed' })
        .expect(200)
    ).body as Incident
    expect(closed.reportEscalatedAt).toBe(reportLate.toISOString())
    expect((await alertsOf('incident_report_overdue'))[0].closedAt).not.toBeNull()
  })
})
