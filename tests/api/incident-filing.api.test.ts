import { DateTime } from 'luxon'
import Papa from 'papaparse'
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { db } from '#server/db/data-source'
import { AuditEntity } from '#server/modules/audit/audit.entity'
import { AlertEntity } from '#server/modules/completions/completion.entities'
import { deliverPending } from '#server/modules/escalation/deliver'
import { runEscalations } from '#server/modules/escalation/escalate'
import { NotificationEntity } from '#server/modules/escalation/escalation.entities'
import { escalateOverdueIncidents } from '#server/modules/incidents/incidents.service'
import { ChangeOutboxEntity } from '#server/realtime/change-outbox.entity'
import { IncidentReportRowSchema } from '#shared/schemas/animal-report'
import type { FileIncidentInput, Incident } from '#shared/schemas/incident'
import { ensureFacilityAndParameters, makeAreaWithTanks } from '#tests/support/facility-fixtures'
import { messagesTo, startMailCatcher } from '#tests/support/mail-fixtures'
import { startTestApp, type TestApp } from '#tests/support/test-app'

let t: TestApp
let mail: Awaited<ReturnType<typeof startMailCatcher>>
let zone: string
beforeAll(async () => {
  // Own database: the escalation clock acts on every alert it finds (record 006).
  t = await startTestApp({}, { ownDatabase: true })
  mail = await startMailCatcher(t.config)
  zone = (await ensureFacilityAndParameters()).timeZone
})
afterAll(async () => {
  await mail.close()
  await t.close()
})

const MIN = 60_000
const HOUR = 60 * MIN

type Agent = Awaited<ReturnType<TestApp['signedInAgent']>>['agent']

/** Two fish escaped over a tank's rim during a net change; noticed `noticedAgo` ago. */
async function escape(noticedAgo = 10 * MIN): Promise<FileIncidentInput> {
  const { tanks } = await makeAreaWithTanks(1)
  const noticed = Date.now() - noticedAgo
  return {
    title: `Escape from ${tanks[0].code}`,
    whatHappened: 'Two fish jumped the rim while the net was changed and went down the floor drain.',
    startedAt: new Date(noticed - 20 * MIN).toISOString(),
    noticedAt: new Date(noticed).toISOString(),
    tankIds: [tanks[0].id],
    batchIds: [],
    affected: 2,
    dead: 0,
    immediateActions: 'Drain grate checked; lid put back on the tank.',
  }
}

const incidentCount = async () =>
  db()
    .query<Array<{ n: string }>>('SELECT COUNT(*) AS n FROM incidents')
    .then((r) => Number(r[0].n))

describe('filing an incident by hand', () => {
  test('a supervisor files an escape: it is open at once, counts down from when it was noticed, is audited and announced, and is in the list and the committee report', async () => {
    const { agent, person } = await t.signedInAgent('supervisor')
    const input = await escape()
    const res = await agent.post('/api/incidents').send(input).expect(201)
    const filed = res.body as Incident
    expect(filed).toMatchObject({ status: 'open', source: 'manual', taskId: null, affected: 2, dead: 0, filedById: person.id, filedByName: person.name })
    expect(filed.decidedById).toBe(person.id)
    const noticed = Date.parse(input.noticedAt)
    expect(Date.parse(filed.noticedAt)).toBe(noticed)
    // The facility's defaults (24 h / 72 h / 7 d; common practice, local codes decide).
    expect(Date.parse(filed.welfareDueAt) - noticed).toBe(24 * HOUR)
    expect(Date.parse(filed.committeeDueAt) - noticed).toBe(72 * HOUR)
    expect(Date.parse(filed.reportDueAt) - noticed).toBe(7 * 24 * HOUR)

    const listed = ((await agent.get('/api/incidents').expect(200)).body as Incident[]).find((i) => i.id === filed.id)
    expect(listed?.title).toBe(input.title)
    const audited = await db()
      .getRepository(AuditEntity)
      .findBy({ entity: 'incident', entityId: String(filed.id) })
    expect(audited.map((a) => [a.action, a.personId])).toEqual([['create', person.id]])
    expect(
      await db()
        .getRepository(ChangeOutboxEntity)
        .countBy({ kind: 'incident', entityId: String(filed.id) }),
    ).toBe(1)

    const { agent: manager } = await t.signedInAgent('manager')
    // The report's periods are facility days.
    const today = DateTime.now().setZone(zone).toISODate()!
    const yesterday = DateTime.now().setZone(zone).minus({ days: 1 }).toISODate()!
    const rows = IncidentReportRowSchema.array().parse((await manager.get(`/api/reports/incidents?from=${yesterday}&to=${today}`).expect(200)).body)
    const row = rows.find((r) => r.id === filed.id)
    expect(row).toMatchObject({ source: 'manual', status: 'open', affected: 2, dead: 0, welfare: 'due', committee: 'due', report: 'due' })
    const csv = await manager.get(`/api/reports/incidents?from=${yesterday}&to=${today}&format=csv`).expect(200)
    const parsed = Papa.parse<Record<string, unknown>>(csv.text, {
      header: true,
      dynamicTyping: (field) => field === 'id' || field === 'affected' || field === 'dead',
      skipEmptyLines: true,
    })
    expect(parsed.data.map((r) => IncidentReportRowSchema.parse(r)).find((r) => r.id === filed.id)).toEqual(row)
  })

  test('the deadlines come from the facility settings in force when it is filed', async () => {
    const { agent: manager } = await t.signedInAgent('manager')
    const before = (await manager.get('/api/stock/settings').expect(200)).body as Record<string, number>
    await manager.patch('/api/stock/settings').send({ notifyWelfareOfficerHours: 12, notifyCommitteeHours: 48, fullReportHours: 120 }).expect(200)
    try {
      const input = await escape()
      const filed = (await manager.post('/api/incidents').send(input).expect(201)).body as Incident
      const noticed = Date.parse(input.noticedAt)
      expect([filed.welfareDueAt, filed.committeeDueAt, filed.reportDueAt].map((d) => (Date.parse(d) - noticed) / HOUR)).toEqual([12, 48, 120])
    } finally {
      const { notifyWelfareOfficerHours, notifyCommitteeHours, fullReportHours } = before
      await manager.patch('/api/stock/settings').send({ notifyWelfareOfficerHours, notifyCommitteeHours, fullReportHours }).expect(200)
    }
  })

  test('a technician may file one, but it waits for a supervisor to confirm it; an observer may not file', async () => {
    const { agent: tech, person } = await t.signedInAgent('technician')
    const filed = (
      await tech
        .post('/api/incidents')
        .send(await escape())
        .expect(201)
    ).body as Incident
    expect(filed).toMatchObject({ status: 'proposed', source: 'manual', filedById: person.id, decidedById: null })
    const { agent: supervisor } = await t.signedInAgent('supervisor')
    const confirmed = await supervisor.post(`/api/incidents/${filed.id}/confirm`).send({ reason: 'Seen the empty drain grate myself' }).expect(200)
    expect(confirmed.body.status).toBe('open')

    const { agent: observer } = await t.signedInAgent('observer')
    const count = await incidentCount()
    await observer
      .post('/api/incidents')
      .send(await escape())
      .expect(403)
    expect(await incidentCount()).toBe(count)
  })

  test.each([
    ['no title', (i: FileIncidentInput) => ({ ...i, title: '  ' }), 'title'],
    ['more dead than affected', (i: FileIncidentInput) => ({ ...i, affected: 1, dead: 2 }), 'dead'],
    ['noticed before it started', (i: FileIncidentInput) => ({ ...i, noticedAt: new Date(Date.parse(i.startedAt) - MIN).toISOString() }), 'noticedAt'],
    [
      'noticed tomorrow',
      (i: FileIncidentInput) => ({ ...i, startedAt: new Date().toISOString(), noticedAt: new Date(Date.now() + 24 * HOUR).toISOString() }),
      'noticedAt',
    ],
    ['a tank that does not exist', (i: FileIncidentInput) => ({ ...i, tankIds: [2_000_000_000] }), 'tankIds'],
    ['a negative count', (i: FileIncidentInput) => ({ ...i, affected: -1 }), 'affected'],
  ])('%s is refused with 400 and nothing is kept', async (_what, change, field) => {
    const { agent } = await t.signedInAgent('supervisor')
    const count = await incidentCount()
    const res = await agent
      .post('/api/incidents')
      .send(change(await escape()))
      .expect(400)
    expect(res.body.error.code).toBe('validation_failed')
    expect(res.body.error.fieldErrors).toHaveProperty([field])
    expect(await incidentCount()).toBe(count)
  })
})

describe('a hand-filed incident past its deadlines', () => {
  async function fileOverdue(agent: Agent) {
    // Noticed 73 hours ago: the welfare officer's and the committee's deadlines have both passed.
    return (
      await agent
        .post('/api/incidents')
        .send(await escape(73 * HOUR))
        .expect(201)
    ).body as Incident
  }
  const alertsOf = (incidentId: number) => db().getRepository(AlertEntity).findBy({ incidentId })

  test('escalates each overdue deadline once, on the standard ladder, first to whoever filed it, with a message that opens the incident', async () => {
    const { agent, person } = await t.signedInAgent('supervisor')
    const incident = await fileOverdue(agent)
    const now = new Date()
    await escalateOverdueIncidents(now)
    await escalateOverdueIncidents(new Date(now.getTime() + 10 * MIN))
    const alerts = await alertsOf(incident.id)
    expect(alerts.map((a) => a.kind).sort()).toEqual(['incident_overdue', 'incident_welfare_overdue'])
    expect(alerts.every((a) => a.taskId === null)).toBe(true)

    await runEscalations(now)
    await runEscalations(new Date(now.getTime() + MIN))
    const firstStep = await db().getRepository(NotificationEntity).findBy({ alertId: alerts[0].id, step: 0 })
    // The built-in standard ladder's first step is the "assignee": for a hand-filed incident, the person who filed it.
    expect(firstStep.map((n) => n.personId)).toEqual([person.id])

    await deliverPending(mail.config, mail.transport, new Date(now.getTime() + MIN))
    const mails = await messagesTo(person.email)
    expect(mails).toHaveLength(2)
    for (const m of mails) {
      expect(m.subject).toMatch(new RegExp(`^INCIDENT deadline passed: Incident #${incident.id} `))
      expect(m.text).toContain(`${t.config.publicUrl}/incidents/${incident.id}`)
    }

    // Acknowledging from the mail: with no task to open, the answer page links to the incident.
    const ackPath = /\/ack\/[\w.-]+/.exec(mails[0].text)![0]
    const answered = await request(t.app).post(ackPath).type('form').send({}).expect(200)
    expect(answered.text).toContain(`<a href="/incidents/${incident.id}">Open the incident</a>`)
    expect(answered.text).not.toContain('Open the task')
  })

  test('a deadline met after it escalated stops its alert climbing', async () => {
    const { agent } = await t.signedInAgent('supervisor')
    const incident = await fileOverdue(agent)
    await escalateOverdueIncidents(new Date())
    await agent.patch(`/api/incidents/${incident.id}`).send({ welfareNotifiedAt: new Date().toISOString() }).expect(200)
    const byKind = new Map((await alertsOf(incident.id)).map((a) => [a.kind, a]))
    expect(byKind.get('incident_welfare_overdue')?.closedAt).not.toBeNull()
    expect(byKind.get('incident_overdue')?.closedAt).toBeNull()
  })
})
