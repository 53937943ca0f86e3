import type { OutboxMessage, TextOutboxMessage } from '#shared/schemas/ladder'
import { db } from '../../db/data-source'
import type { AppConfig } from '../../lib/config'
import { AppError, notFound } from '../../lib/errors'
import { OutboxEntity, TextOutboxEntity } from './escalation.entities'

/** Local mail mode only: the latest mail the app sent, as the local SMTP server received it. */
export async function localMail(config: AppConfig): Promise<OutboxMessage[]> {
  if (config.mail.mode !== 'local') throw notFound('The outbox (only in local mail mode)')
  const rows = await db()
    .getRepository(OutboxEntity)
    .find({ order: { id: 'DESC' }, take: 200 })
  return rows.map((r) => ({ ...r, receivedAt: r.receivedAt.toISOString() }))
}

const localOnly = (config: AppConfig) => {
  if (config.sms.mode !== 'local' || !config.sms.apiBaseUrl) throw notFound('The text outbox (only in local text mode)')
}

export async function localTexts(config: AppConfig): Promise<TextOutboxMessage[]> {
  localOnly(config)
  const rows = await db()
    .getRepository(TextOutboxEntity)
    .find({ order: { id: 'DESC' }, take: 200 })
  return rows.map(({ statusCallback: _callback, ...r }) => ({ ...r, receivedAt: r.receivedAt.toISOString() }))
}

/**
 * Local mode: asks the stand-in provider to deliver a reply from the recipient of a text, so
 * it reaches the app through the same signed inbound webhook a real reply would.
 */
export async function replyAsRecipient(config: AppConfig, textId: number, body: string): Promise<{ answer: string }> {
  localOnly(config)
  const text = await db().getRepository(TextOutboxEntity).findOneBy({ id: textId, direction: 'outbound' })
  if (!text) throw notFound('That text')
  const res = await fetch(`${config.sms.apiBaseUrl}/local/inbound`, {
    method: 'POST',
    headers: {
      'content-type': 'application/json',
      authorization: `Basic ${Buffer.from(`${config.sms.accountSid}:${config.sms.authToken}`).toString('base64')}`,
    },
    body: JSON.stringify({ from: text.to, body }),
    signal: AbortSignal.timeout(10_000),
  })
  const xml = await res.text()
  if (!res.ok) throw new AppError(503, 'service_unavailable', `The local text provider could not deliver the reply (${res.status}).`)
  // The app's answer is TwiML: the text inside <Message> is what the person would receive.
  return { answer: /<Message>([^<]*)<\/Message>/.exec(xml)?.[1] ?? '' }
}
