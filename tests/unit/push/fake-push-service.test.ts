import { afterAll, beforeAll, describe, expect, test } from 'vitest'
import webpush from 'web-push'
import { loadConfig } from '#server/lib/config'
import { createPushSender } from '#server/push/push-client'
import { startFakePushService, vapidProblem, type FakePushService } from '#server/push/fake-push-service'

let service: FakePushService
beforeAll(async () => {
  service = await startFakePushService()
})
afterAll(() => service.close())

const serverKeys = webpush.generateVAPIDKeys()
const subject = 'mailto:night-desk@example.org'
const config = { ...loadConfig({}), push: { ...loadConfig({}).push, enabled: true, subject, vapid: serverKeys } }

/** Posts an encrypted body the way web-push would, but with the Authorization header a test chooses. */
async function postWith(endpoint: string, keys: { p256dh: string; auth: string }, authorization: string) {
  const request = webpush.generateRequestDetails({ endpoint, keys }, JSON.stringify({ title: 'x' }), { vapidDetails: { subject, ...serverKeys }, TTL: 60 })
  const headers = { ...(request.headers as Record<string, string>), Authorization: authorization }
  return fetch(endpoint, { method: 'POST', headers, body: new Uint8Array(request.body) })
}

describe('the stand-in push service', () => {
  test('accepts a message signed with the key the device subscribed with, and decrypts what web-push encrypted', async () => {
    const device = service.subscribe(serverKeys.publicKey)
    const result = await createPushSender(config)!.send(device, { title: 'MISSED: Oxygen check', ackUrl: '/ack/1.2.x' })
    expect(result.status).toBe('accepted')
    expect(service.receivedAt(device.endpoint).map((r) => r.payload)).toEqual([{ title: 'MISSED: Oxygen check', ackUrl: '/ack/1.2.x' }])
  })

  test('refuses a VAPID JWT signed by another key while claiming the subscribed key', async () => {
    const device = service.subscribe(serverKeys.publicKey)
    const intruder = webpush.generateVAPIDKeys()
    const forged = webpush.getVapidHeaders(service.url, subject, intruder.publicKey, intruder.privateKey, 'aes128gcm').Authorization
    const claimingOurKey = forged.replace(/k=[\w-]+$/, `k=${serverKeys.publicKey}`)
    const res = await postWith(device.endpoint, device.keys, claimingOurKey)
    expect(res.status).toBe(403)
    expect(await res.text()).toBe('The JWT signature does not verify')
    // Signed by the intruder under its own key: well formed, but not the key this device subscribed with.
    expect((await postWith(device.endpoint, device.keys, forged)).status).toBe(403)
    expect(service.receivedAt(device.endpoint)).toHaveLength(0)
  })

  test('checks the claims: a changed audience breaks the signature; an expired or foreign-audience token is refused', () => {
    const signed = (audience: string, expiration?: number) =>
      webpush.getVapidHeaders(audience, subject, serverKeys.publicKey, serverKeys.privateKey, 'aes128gcm', expiration).Authorization
    const now = Date.now()
    expect(vapidProblem(signed(service.url), service.url, serverKeys.publicKey, now)).toBeNull()
    expect(vapidProblem(signed('https://push.example.net'), service.url, serverKeys.publicKey, now)).toBe(`The JWT audience is not ${service.url}`)
    const [, jwt] = /t=([^,]+),/.exec(signed(service.url))!
    const [head, body, signature] = jwt.split('.')
    const otherAudience = Buffer.from(JSON.stringify({ ...JSON.parse(Buffer.from(body, 'base64url').toString()), aud: 'https://push.example.net' })).toString(
      'base64url',
    )
    expect(
      vapidProblem(`vapid t=${head}.${otherAudience}.${signature}, k=${serverKeys.publicKey}`, 'https://push.example.net', serverKeys.publicKey, now),
    ).toBe('The JWT signature does not verify')
    const inAnHour = Math.floor(now / 1000) + 3600
    expect(vapidProblem(signed(service.url, inAnHour), service.url, serverKeys.publicKey, now + 2 * 3_600_000)).toBe('The JWT has expired')
    expect(vapidProblem('WebPush abc', service.url, undefined, now)).toBe('Missing or malformed VAPID Authorization header')
  })

  test('answers 410 Gone for a subscription the browser dropped, which the sender reports as gone', async () => {
    const device = service.subscribe(serverKeys.publicKey)
    service.unsubscribe(device.endpoint)
    expect(await createPushSender(config)!.send(device, { title: 'x' })).toEqual({ status: 'gone', code: 410 })
  })
})
