import { randomBytes } from 'node:crypto'
import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import type { DataSource } from 'typeorm'
import { db } from '#server/db/data-source'
import { TextOutboxEntity } from '#server/modules/escalation/escalation.entities'
import { PersonEntity } from '#server/modules/people/person.entity'
import { OnCallEntity } from '#server/modules/roster/roster.entities'
import { startFakeTextProvider, type FakeTextProvider } from '#server/sms/fake-text-provider'
import { freePort, openDb, sleep, startApp, waitFor, type AppProcess } from './support/harness'
import { freshTanks, notificationsFor, overdueTask, tag } from './support/fixtures'

let ds: DataSource
let smtpPort: number
let provider: FakeTextProvider
const apps: AppProcess[] = []
const account = { sid: `AC${randomBytes(16).toString('hex')}`, token: randomBytes(24).toString('base64url') }

beforeAll(async () => {
  ds = await openDb()
  smtpPort = await freePort()
  // The provider runs in the test process, so it outlives the app it serves; it first holds each request unanswered.
  provider = await startFakeTextProvider({ accountSid: account.sid, authToken: account.token, publicUrl: 'http://127.0.0.1:9', holdRequests: true })
})
afterAll(async () => {
  for (const app of apps) await app.kill('SIGKILL')
  await provider?.close()
  await ds?.destroy()
})

const textsTo = (phone: string) => db().getRepository(TextOutboxEntity).findBy({ to: phone, direction: 'outbound' })

describe('a text claimed but not finished', () => {
  test('the app killed between claiming a text and hearing back from the provider sends no second copy after a restart', async () => {
    const env = { ROUNDTIDE_SMS_MODE: 'twilio', ROUNDTIDE_SMS_API_URL: provider.url, TWILIO_ACCOUNT_SID: account.sid, TWILIO_AUTH_TOKEN: account.token }
    const phone = `+1555${String(Math.floor(Math.random() * 1e7)).padStart(7, '0')}`
    const person = await db()
      .getRepository(PersonEntity)
      .save({
        email: `oncall-${tag()}@brackenwater.example`,
        name: 'Wren Oakes',
        role: 'technician',
        passwordHash: 'x',
        onCallEligible: true,
        phone,
        channels: ['sms'],
      })
    // On call from a minute ago: the latest duty, so this person holds it now and gets every channel they enabled (texts only).
    await db()
      .getRepository(OnCallEntity)
      .save({
        personId: person.id,
        fromDate: '2000-01-01',
        toDate: '2000-01-02',
        startsAt: new Date(Date.now() - 60_000),
        endsAt: new Date(Date.now() + 3_600_000),
      })
    const [tank] = await freshTanks(1)
    const task = await overdueTask(tank, `Text claim ${tag()}`, person.id, new Date(Date.now() - 1000))

    const first = await startApp('app (sending)', { smtpPort, schedulerIntervalMs: 500, env })
    apps.push(first)
    // The provider has the request, the row is claimed, and the app has not heard back.
    await waitFor('the text request to reach the provider', async () => (await textsTo(phone)).length === 1, 90_000).catch(async (err: Error) => {
      throw new Error(`${err.message}; rows: ${JSON.stringify(await notificationsFor(task.id))}\n${first.output()}`)
    })
    const claimed = (await notificationsFor(task.id)).filter((n) => n.channel === 'sms')
    expect(claimed.map((n) => n.status)).toEqual(['sending'])
    await first.kill('SIGKILL')

    provider.answerRequests()
    const second = await startApp('app (after restart)', { smtpPort, schedulerIntervalMs: 500, env })
    apps.push(second)
    // Many scheduler ticks later the claimed row has not been sent again.
    await sleep(5000)
    expect(second.alive()).toBe(true)
    expect(await textsTo(phone)).toHaveLength(1)
    const rows = (await notificationsFor(task.id)).filter((n) => n.channel === 'sms')
    expect(rows).toHaveLength(1)
    expect(rows[0].status).toBe('sending')
  })
})
