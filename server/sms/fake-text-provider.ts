import { randomBytes, timingSafeEqual } from 'node:crypto'
import type { AddressInfo } from 'node:net'
import express from 'express'
import { db } from '../db/data-source'
import { logger } from '../lib/logger'
import { TextOutboxEntity } from '../modules/escalation/escalation.entities'
import { postSignedWebhook } from './text-client'

export interface FakeTextProviderOptions {
  accountSid: string
  authToken: string
  /** Where the provider posts status callbacks and inbound texts: the app's public URL. */
  publicUrl: string
  port?: number
  /** Post `sent` then `delivered` to each message's status callback (local mode); tests post their own. */
  autoStatus?: boolean
  /** Hold every Messages request without answering, as a provider that is slow to answer (reliability tests). */
  holdRequests?: boolean
  /** How webhooks reach the app; over HTTP unless a test routes them in process. */
  deliver?: WebhookDelivery
}

export type WebhookDelivery = (
  url: string,
  params: Record<string, string>,
  authToken: string,
) => Promise<{ status: number; contentType: string | null; text: string }>

const overHttp: WebhookDelivery = async (url, params, authToken) => {
  const res = await postSignedWebhook(url, params, authToken)
  return { status: res.status, contentType: res.headers.get('content-type'), text: await res.text() }
}

const sid = (prefix: string) => prefix + randomBytes(16).toString('hex')
const providerError = (status: number, code: number, message: string) => ({ code, message, more_info: `local-provider/errors/${code}`, status })
/** Numbers the stand-in refuses as unreachable, so a failing channel can be shown (common practice for provider test numbers). */
export const UNREACHABLE_NUMBER_PREFIX = '+1555000'

/**
 * A stand-in text provider on loopback speaking the provider's REST shape: `POST
 * /2010-04-01/Accounts/{sid}/Messages.json` with Basic auth and a form body, answering the
 * provider's message JSON. It keeps what it received for the Outbox page, posts signed status
 * callbacks and can deliver an inbound reply to the app as the provider would.
 */
export async function startFakeTextProvider(opts: FakeTextProviderOptions) {
  const app = express()
  app.use(express.urlencoded({ extended: false, limit: '16kb' }))
  app.use(express.json({ limit: '16kb' }))
  const expectedAuth = Buffer.from(`Basic ${Buffer.from(`${opts.accountSid}:${opts.authToken}`).toString('base64')}`)
  const pending: Array<() => void> = []
  const deliver = opts.deliver ?? overHttp
  let holding = opts.holdRequests ?? false

  app.use((req, res, next) => {
    const given = Buffer.from(req.header('authorization') ?? '')
    if (given.length === expectedAuth.length && timingSafeEqual(given, expectedAuth)) return next()
    res.status(401).json(providerError(401, 20003, 'Authenticate'))
  })

  app.post('/2010-04-01/Accounts/:account/Messages.json', async (req, res) => {
    if (holding) {
      // Keeps the request open, as a provider that has received it but not yet answered.
      await db()
        .getRepository(TextOutboxEntity)
        .insert(outboundRow(req.body as Record<string, string>, sid('SM')))
      pending.push(() => res.destroy())
      return
    }
    const { To: to, From: from, Body: body, StatusCallback: statusCallback } = req.body as Record<string, string>
    if (req.params.account !== opts.accountSid) return void res.status(404).json(providerError(404, 20404, 'The requested resource was not found'))
    if (!to || !from || !body) return void res.status(400).json(providerError(400, 21604, "A 'To', 'From' and 'Body' are required."))
    if (to.startsWith(UNREACHABLE_NUMBER_PREFIX))
      return void res.status(400).json(providerError(400, 21211, `The 'To' number ${to} is not a valid phone number.`))
    const messageSid = sid('SM')
    const row = outboundRow(req.body as Record<string, string>, messageSid)
    await db().getRepository(TextOutboxEntity).insert(row)
    const now = new Date().toUTCString()
    res.status(201).json({
      account_sid: opts.accountSid,
      api_version: '2010-04-01',
      body,
      date_created: now,
      date_sent: null,
      date_updated: now,
      direction: 'outbound-api',
      error_code: null,
      error_message: null,
      from,
      messaging_service_sid: null,
      num_media: '0',
      num_segments: String(Math.ceil(body.length / 153) || 1),
      price: null,
      price_unit: 'USD',
      sid: messageSid,
      status: 'queued',
      subresource_uris: { media: `/2010-04-01/Accounts/${opts.accountSid}/Messages/${messageSid}/Media.json` },
      to,
      uri: `/2010-04-01/Accounts/${opts.accountSid}/Messages/${messageSid}.json`,
    })
    if (opts.autoStatus && statusCallback) void reportStatuses(messageSid, statusCallback, ['sent', 'delivered'])
  })

  // The Outbox's "reply as the recipient" button: the provider delivers an inbound text to the app.
  app.post('/local/inbound', async (req, res) => {
    const { from, body } = req.body as { from?: string; body?: string }
    if (!from || !body) return void res.status(400).json(providerError(400, 21604, 'from and body are required'))
    const result = await deliverInbound(from, body)
    res
      .status(result.status)
      .type(result.contentType ?? 'text/plain')
      .send(result.text)
  })

  function outboundRow(form: Record<string, string>, messageSid: string) {
    return {
      sid: messageSid,
      direction: 'outbound' as const,
      to: form.To ?? '',
      from: form.From ?? '',
      body: form.Body ?? '',
      status: 'queued',
      statusCallback: form.StatusCallback ?? null,
      receivedAt: new Date(),
    }
  }

  async function reportStatuses(messageSid: string, url: string, statuses: string[]) {
    for (const status of statuses) {
      const row = await db().getRepository(TextOutboxEntity).findOneBy({ sid: messageSid })
      if (!row) return
      await db().getRepository(TextOutboxEntity).update({ sid: messageSid }, { status })
      const params = {
        AccountSid: opts.accountSid,
        ApiVersion: '2010-04-01',
        From: row.from,
        MessageSid: messageSid,
        MessageStatus: status,
        SmsSid: messageSid,
        SmsStatus: status,
        To: row.to,
      }
      await deliver(url, params, opts.authToken).catch((err: unknown) =>
        logger.warn({ err, messageSid }, 'local text provider could not post a status callback'),
      )
    }
  }

  /** A text from `from` to our number, posted to the app's inbound webhook like the provider does. */
  async function deliverInbound(from: string, body: string) {
    const messageSid = sid('SM')
    const to =
      (
        await db()
          .getRepository(TextOutboxEntity)
          .findOne({ where: { to: from, direction: 'outbound' }, order: { id: 'DESC' } })
      )?.from ?? ''
    await db()
      .getRepository(TextOutboxEntity)
      .insert({ sid: messageSid, direction: 'inbound', to, from, body, status: 'received', statusCallback: null, receivedAt: new Date() })
    const params = {
      AccountSid: opts.accountSid,
      ApiVersion: '2010-04-01',
      Body: body,
      From: from,
      MessageSid: messageSid,
      NumMedia: '0',
      NumSegments: '1',
      SmsMessageSid: messageSid,
      SmsSid: messageSid,
      SmsStatus: 'received',
      To: to,
    }
    return deliver(`${opts.publicUrl}/hooks/sms/inbound`, params, opts.authToken)
  }

  const server = await new Promise<ReturnType<typeof app.listen>>((resolve, reject) => {
    const s = app.listen(opts.port ?? 0, '127.0.0.1', () => resolve(s))
    s.once('error', reject)
  })
  const { port } = server.address() as AddressInfo
  return {
    url: `http://127.0.0.1:${port}`,
    port,
    reportStatuses,
    deliverInbound,
    /** Stops holding requests (those held so far are dropped, as by a provider that never answered). */
    answerRequests() {
      holding = false
      pending.splice(0).forEach((drop) => drop())
    },
    close: () =>
      new Promise<void>((resolve) => {
        pending.splice(0).forEach((drop) => drop())
        server.closeAllConnections()
        server.close(() => resolve())
      }),
  }
}

export type FakeTextProvider = Awaited<ReturnType<typeof startFakeTextProvider>>
