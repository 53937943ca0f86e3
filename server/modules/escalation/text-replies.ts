import { db } from '../../db/data-source'
import { findContact } from '../people/contact.service'
import { queueFallback } from './channels'
import { acknowledgeAlert } from './escalate'
import { NotificationEntity } from './escalation.entities'

export type TextReplyOutcome = 'acknowledged' | 'already' | 'unknown' | 'inactive'

/**
 * A text answered with its reply code acknowledges the alert exactly as the mail link does:
 * the code is matched with the number it was sent to, and used once.
 */
export async function acknowledgeByTextReply(from: string, body: string, now = new Date()): Promise<TextReplyOutcome> {
  const code = /\b(\d{4})\b/.exec(body)?.[1]
  if (!code) return 'unknown'
  const repo = db().getRepository(NotificationEntity)
  const row = await repo.findOne({ where: { channel: 'sms', destination: from.trim(), replyCode: code }, order: { id: 'DESC' } })
  if (!row) return 'unknown'
  const person = await findContact(row.personId)
  if (!person?.active) return 'inactive'
  const claimed = await repo.createQueryBuilder().update().set({ ackUsedAt: now }).where('id = :id AND ackUsedAt IS NULL', { id: row.id }).execute()
  if (!claimed.affected) return 'already'
  const first = await acknowledgeAlert(row.alertId, row.personId, now)
  return first ? 'acknowledged' : 'already'
}

const FINAL_FAILURES = new Set(['failed', 'undelivered'])
const LATER_THAN: Record<string, number> = { accepted: 0, queued: 1, sending: 2, sent: 3, delivered: 4, undelivered: 4, failed: 4, read: 5 }

/**
 * A delivery status from the provider, shown on the alert record. Callbacks may arrive out of
 * order, so a status never goes back to an earlier one; a final failure queues the next channel.
 */
export async function recordTextStatus(messageSid: string, status: string, errorCode: string | undefined, now = new Date()) {
  const repo = db().getRepository(NotificationEntity)
  const row = await repo.findOneBy({ providerId: messageSid, channel: 'sms' })
  if (!row) return false
  if (row.providerStatus && (LATER_THAN[status] ?? 0) <= (LATER_THAN[row.providerStatus] ?? 0)) return true
  await repo.update(row.id, { providerStatus: status.slice(0, 40) })
  if (FINAL_FAILURES.has(status) && row.status === 'sent') {
    await repo.update(row.id, { status: 'undelivered', lastError: `The provider reports the text ${status}${errorCode ? ` (error ${errorCode})` : ''}` })
    // If the alert was answered meanwhile, delivery supersedes the queued fallback instead of sending it.
    await queueFallback(row, now)
  }
  return true
}
