import { createHmac } from 'node:crypto'
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import { db } from '#server/db/data-source'
import { loadConfig } from '#server/lib/config'
import { MIN_SECRET_LENGTH, withStoredSecrets } from '#server/lib/secrets'
import { signAckToken } from '#server/mail/ack-token'
import { AlertEntity } from '#server/modules/completions/completion.entities'
import { NotificationEntity } from '#server/modules/escalation/escalation.entities'
import { ensureFacilityAndParameters, makeAreaWithTanks } from '#tests/support/facility-fixtures'
import { makeTankTask } from '#tests/support/task-fixtures'
import { startTestApp, testConfig, type TestApp } from '#tests/support/test-app'

let t: TestApp
beforeAll(async () => {
  t = await startTestApp()
  await ensureFacilityAndParameters()
})
afterAll(() => t.close())

const PUBLISHED_DEFAULT = 'roundtide-local-session-secret-change-me'
const HOUR = 3_600_000

/** An open missed-task alert with one mailed notification to a technician. */
async function mailedAlert() {
  const { tanks } = await makeAreaWithTanks(1)
  const task = await makeTankTask(tanks[0], { dueAt: new Date(Date.now() - 2 * HOUR) })
  const person = await t.createPersonWithRole('technician')
  const alert = await db().getRepository(AlertEntity).save({ taskId: task.id, kind: 'missed_task', detail: 'Missed', ladderId: null, startedAt: new Date() })
  const row = await db().getRepository(NotificationEntity).save({
    alertId: alert.id,
    step: 1,
    personId: person.id,
    email: person.email,
    subject: 'Missed task',
    nextAttemptAt: new Date(),
    status: 'sent',
    sentAt: new Date(),
  })
  return { alert, row, person }
}

const acknowledged = async (alertId: number) => (await db().getRepository(AlertEntity).findOneByOrFail({ id: alertId })).acknowledgedAt

describe('acknowledge links cannot be forged', () => {
  test('a token an outsider signs with the secret from the public source is refused and changes nothing', async () => {
    const { alert, row } = await mailedAlert()
    // What an attacker could compute before: the HMAC under the published default session secret.
    const payload = `${row.id}.${Math.floor((Date.now() + HOUR) / 1000)}`
    const forged = `${payload}.${createHmac('sha256', `ack:${PUBLISHED_DEFAULT}`).update(payload).digest('base64url')}`
    await request(t.app).post(`/ack/${forged}`).type('form').send({}).expect(400)
    expect(await acknowledged(alert.id)).toBeNull()
  })

  test('the cookie key does not sign acknowledgements: a token under the session secret is refused', async () => {
    expect(t.config.ackSecret).not.toBe(t.config.sessionSecret)
    const { alert, row } = await mailedAlert()
    const underCookieKey = signAckToken(t.config.sessionSecret, row.id, new Date(Date.now() + HOUR))
    await request(t.app).post(`/ack/${underCookieKey}`).type('form').send({}).expect(400)
    expect(await acknowledged(alert.id)).toBeNull()
    // The real key still works, so the refusal above is about the key, not the link.
    await request(t.app)
      .post(`/ack/${signAckToken(t.config.ackSecret, row.id, new Date(Date.now() + HOUR))}`)
      .type('form')
      .send({})
      .expect(200)
    expect(await acknowledged(alert.id)).not.toBeNull()
  })

  test('a person who is no longer active cannot acknowledge with a link mailed before', async () => {
    const { alert, row, person } = await mailedAlert()
    const manager = (await t.signedInAgent('manager')).agent
    await manager.patch(`/api/people/${person.id}`).send({ active: false }).expect(200)
    const res = await request(t.app)
      .post(`/ack/${signAckToken(t.config.ackSecret, row.id, new Date(Date.now() + HOUR))}`)
      .type('form')
      .send({})
      .expect(403)
    expect(res.text).toContain('no longer active')
    expect(await acknowledged(alert.id)).toBeNull()
    expect((await db().getRepository(NotificationEntity).findOneByOrFail({ id: row.id })).ackUsedAt).toBeNull()
  })
})

describe('secrets are generated, kept and checked', () => {
  const production = (env: Record<string, string> = {}) => ({
    ...testConfig(),
    ...loadConfig({ ...process.env, ROUNDTIDE_DB_NAME: t.config.db.database, NODE_ENV: 'production', ...env }),
  })

  test('without any secret set, production starts with strong secrets generated once and kept in the database', async () => {
    const first = await withStoredSecrets(production({ ROUNDTIDE_SESSION_SECRET: '', ROUNDTIDE_ACK_SECRET: '' }), t.dataSource)
    const second = await withStoredSecrets(production({ ROUNDTIDE_SESSION_SECRET: '', ROUNDTIDE_ACK_SECRET: '' }), t.dataSource)
    expect(first.sessionSecret.length).toBeGreaterThanOrEqual(MIN_SECRET_LENGTH)
    expect(first.ackSecret.length).toBeGreaterThanOrEqual(MIN_SECRET_LENGTH)
    expect(first.sessionSecret).not.toBe(first.ackSecret)
    expect(second.sessionSecret).toBe(first.sessionSecret) // kept: sessions and mailed links survive a restart
    expect(second.ackSecret).toBe(first.ackSecret)
    expect(first.sessionSecret).not.toBe(PUBLISHED_DEFAULT)
    const rows = (await t.dataSource.query('SELECT name, value FROM app_secrets ORDER BY name')) as Array<{ name: string; value: string }>
    // sms_local: the local text stand-in's token (ROUNDTIDE_SMS_MODE=local is the default); vapid: the push key pair.
    expect(rows.map((r) => r.name)).toEqual(['ack', 'session', 'sms_local', 'vapid'])
    // Browsers subscribed with the public half, so a restart must sign with the same pair.
    expect(second.push.vapid).toEqual(first.push.vapid)
    const publicKey = Buffer.from(first.push.vapid!.publicKey, 'base64url')
    expect([publicKey.length, publicKey[0]]).toEqual([65, 4]) // an uncompressed P-256 point (RFC 8292 §3.2)
  })

  test.each([
    ['the published default session secret', { ROUNDTIDE_SESSION_SECRET: PUBLISHED_DEFAULT }, /ROUNDTIDE_SESSION_SECRET is a default/],
    ['a short session secret', { ROUNDTIDE_SESSION_SECRET: 'short-but-16chars' }, /ROUNDTIDE_SESSION_SECRET is shorter than 32/],
    ['a short acknowledge key', { ROUNDTIDE_ACK_SECRET: 'tiny' }, /ROUNDTIDE_ACK_SECRET is shorter than 32/],
    ['one secret for both keys', { ROUNDTIDE_SESSION_SECRET: 'x'.repeat(40), ROUNDTIDE_ACK_SECRET: 'x'.repeat(40) }, /must differ/],
    ['the default database password on another host', { ROUNDTIDE_DB_HOST: 'db.internal.invalid' }, /default password/],
  ])('production refuses to start with %s', async (_label, env, message) => {
    await expect(withStoredSecrets(production(env), t.dataSource)).rejects.toThrow(message)
  })

  test('a long secret of the operator’s own is used as given', async () => {
    const own = await withStoredSecrets(production({ ROUNDTIDE_SESSION_SECRET: 'k'.repeat(48), ROUNDTIDE_ACK_SECRET: 'a'.repeat(48) }), t.dataSource)
    expect(own.sessionSecret).toBe('k'.repeat(48))
    expect(own.ackSecret).toBe('a'.repeat(48))
  })
})
