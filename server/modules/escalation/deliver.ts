import nodemailer from 'nodemailer'
import { In, LessThanOrEqual } from 'typeorm'
import { db } from '../../db/data-source'
import type { AppConfig } from '../../lib/config'
import { logger } from '../../lib/logger'
import { signAckToken } from '../../mail/ack-token'
import { AlertEntity } from '../completions/completion.entities'
import { TaskEntity } from '../tasks/task.entity'
import { loadCatalogue, targetLabel } from '../tasks/targets'
import { NotificationEntity, type NotificationRow } from './escalation.entities'
import { composeMessage } from './messages'

const MAX_BACKOFF_MS = 30 * 60_000

export function createTransport(config: AppConfig) {
  return nodemailer.createTransport({
    host: config.mail.host,
    port: config.mail.port,
    secure: false,
    ignoreTLS: config.mail.mode === 'local',
    auth: config.mail.user ? { user: config.mail.user, pass: config.mail.password } : undefined,
    connectionTimeout: 5000,
    greetingTimeout: 5000,
    socketTimeout: 10000,
  })
}

export type Transport = ReturnType<typeof createTransport>

/**
 * Sends every queued message that is due. Each row is claimed before sending, so two
 * processes never send it twice; a failure is kept and retried with back-off, never dropped.
 */
export async function deliverPending(config: AppConfig, transport: Transport, now: Date): Promise<{ sent: number; failed: number }> {
  const repo = db().getRepository(NotificationEntity)
  const due = await repo.find({ where: { status: In(['pending', 'held', 'failed']), nextAttemptAt: LessThanOrEqual(now) }, order: { id: 'ASC' }, take: 200 })
  let sent = 0
  let failed = 0
  const cat = due.length ? await loadCatalogue() : null
  for (const row of due) {
    const claim = await repo.update({ id: row.id, status: row.status }, { status: 'sending' })
    if (!claim.affected) continue
    const alert = await db().getRepository(AlertEntity).findOneBy({ id: row.alertId })
    const task = alert ? await db().getRepository(TaskEntity).findOneBy({ id: alert.taskId }) : null
    if (!alert || !task || alert.acknowledgedAt || alert.closedAt) {
      await repo.update(row.id, { status: 'superseded' })
      continue
    }
    const token = signAckToken(config.ackSecret, row.id, new Date(now.getTime() + config.mail.ackTtlHours * 3_600_000))
    const message = composeMessage({
      alert, task, step: row.step, now,
      targetLabel: targetLabel(task.targetKind, task.targetId, cat!),
      taskUrl: `${config.publicUrl}/tasks/${task.id}`,
      ackUrl: `${config.publicUrl}/ack/${token}`,
    })
    try {
      await transport.sendMail({ from: config.mail.from, to: row.email, subject: message.subject, text: message.text, html: message.html })
      await repo.update(row.id, { status: 'sent', sentAt: new Date(), subject: message.subject.slice(0, 300), attempts: row.attempts + 1, lastError: null })
      sent++
    } catch (err) {
      const attempts = row.attempts + 1
      const wait = Math.min(MAX_BACKOFF_MS, 30_000 * 2 ** (attempts - 1))
      await repo.update(row.id, { status: 'failed', attempts, nextAttemptAt: new Date(now.getTime() + wait), lastError: String((err as Error).message).slice(0, 500), subject: message.subject.slice(0, 300) })
      logger.warn({ err, notification: row.id, attempts }, 'mail not sent; will retry')
      failed++
    }
  }
  return { sent, failed }
}

export type { NotificationRow }
