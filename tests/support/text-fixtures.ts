import request from 'supertest'
import twilio from 'twilio'
import type { Express } from 'express'
import { db } from '#server/db/data-source'
import type { AppConfig } from '#server/lib/config'
import { TextOutboxEntity } from '#server/modules/escalation/escalation.entities'
import { startFakeTextProvider } from '#server/sms/fake-text-provider'
import { createTextSender } from '#server/sms/text-client'

/** Posts a provider webhook to the in-process app, signed with `authToken` over the app's public URL. */
export function postWebhook(app: Express, config: AppConfig, path: string, params: Record<string, string>, authToken = config.sms.authToken) {
  const signature = twilio.getExpectedTwilioSignature(authToken, `${config.publicUrl}${path}`, params)
  return request(app).post(path).type('form').set('x-twilio-signature', signature).send(params)
}

/**
 * The stand-in text provider on a free port, with the SDK-backed sender pointed at it; its
 * status callbacks and inbound replies reach the in-process app signed, as the provider's would.
 */
export async function startTextCatcher(app: Express, config: AppConfig) {
  const fake = await startFakeTextProvider({
    accountSid: config.sms.accountSid,
    authToken: config.sms.authToken,
    publicUrl: config.publicUrl,
    deliver: async (url, params, token) => {
      const res = await postWebhook(app, config, url.slice(config.publicUrl.length), params, token)
      return { status: res.status, contentType: res.headers['content-type'] ?? null, text: res.text }
    },
  })
  const textConfig: AppConfig = { ...config, sms: { ...config.sms, mode: 'local', apiBaseUrl: fake.url } }
  return { fake, config: textConfig, sender: createTextSender(textConfig)!, close: fake.close }
}

export const textsTo = async (phone: string) =>
  await db()
    .getRepository(TextOutboxEntity)
    .find({ where: { to: phone, direction: 'outbound' }, order: { id: 'ASC' } })

/** A phone number of the fictional +1 555 range, unique to one test. */
export const uniquePhone = () => `+1555${String(Math.floor(Math.random() * 1e7)).padStart(7, '0')}`
