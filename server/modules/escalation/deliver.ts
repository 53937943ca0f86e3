import { randomInt } from 'node:crypto'
import nodemailer from 'nodemailer'
import { In, LessThanOrEqual } from 'typeorm'
import { db } from '../../db/data-source'
import type { AppConfig } from '../../lib/config'
import { logger } from '../../lib/logger'
import { signAckToken } from '../../mail/ack-token'
import type { PushSender } from '../../push/push-client'
import { isPermanentTextError, type TextSender } from '../../sms/text-client'
import { findAlert, type AlertRow } from '../completions/alert-records'
import { findTaskRow, type TaskRow } from '../tasks/task-queries'
import { loadCatalogue, targetLabel } from '../tasks/targets'
import { queueFallback } from './channels'
import { NotificationEntity, type NotificationRow } from './escalation.entities'
import { composeMessage, composeText } from './messages'
import { sendPushAlert } from './push-delivery'
import { sendStormSummaries, takeTextSlot } from './text-quota'

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

/** The senders beyond mail; a channel without one is recorded as undelivered and falls back. */
export interface Channels {
  text?: TextSender | null
  push?: PushSender | null
}

/** What one attempt came to: sent, held back by the text limit, or finally refused (which falls back). */
type Outcome =
  | { status: 'sent'; subject: string; providerId?: string; providerStatus?: string; replyCode?: string }
  | { status: 'suppressed' | 'undelivered'; subject: string; note: string }

interface Context {
  config: AppConfig
  transport: Transport
  channels: Channels
  alert: AlertRow
  /** Null for an incident filed by hand: its messages point at the incident. */
  task: TaskRow | null
  label: string
  /** The page the message opens, from the site's root. */
  path: string
  now: Date
}

/**
 * Sends every queued message that is due, on its own channel. Each row is claimed before
 * sending, so two processes never send it twice; a row left `sending` by a crash is never sent
 * again. A failure is kept and retried with back-off, and the person's next channel is queued.
 */
export async function deliverPending(config: AppConfig, transport: Transport, now: Date, channels: Channels = {}): Promise<{ sent: number; failed: number }> {
  const repo = db().getRepository(NotificationEntity)
  const due = await repo.find({ where: { status: In(['pending', 'held', 'failed']), nextAttemptAt: LessThanOrEqual(now) }, order: { id: 'ASC' }, take: 200 })
  let sent = 0
  let failed = 0
  const cat = due.length ? await loadCatalogue() : null
  for (const row of due) {
    const claim = await repo.update({ id: row.id, status: row.status }, { status: 'sending', claimedAt: now })
    if (!claim.affected) continue
    const alert = await findAlert(row.alertId)
    const task = alert?.taskId ? await findTaskRow(alert.taskId) : null
    const about = alert ? subjectOf(alert, task, cat!) : null
    if (!alert || !about || alert.acknowledgedAt || alert.closedAt) {
      await repo.update(row.id, { status: 'superseded' })
      continue
    }
    const context: Context = { config, transport, channels, alert, task, ...about, now }
    try {
      const outcome = await sendOne(row, context)
      const base = { subject: outcome.subject.slice(0, 300), attempts: row.attempts + 1 }
      if (outcome.status === 'sent') {
        await repo.update(row.id, {
          ...base,
          status: 'sent',
          sentAt: new Date(),
          lastError: null,
          providerId: outcome.providerId ?? null,
          providerStatus: outcome.providerStatus ?? null,
          replyCode: outcome.replyCode ?? null,
        })
        sent++
      } else {
        await repo.update(row.id, { ...base, status: outcome.status, lastError: outcome.note.slice(0, 500) })
        if (outcome.status === 'undelivered') await queueFallback(row, now)
      }
    } catch (err) {
      const attempts = row.attempts + 1
      const wait = Math.min(MAX_BACKOFF_MS, 30_000 * 2 ** (attempts - 1))
      const message = String((err as Error).message).slice(0, 500)
      if (row.channel !== 'email' && isPermanentTextError(err)) {
        await repo.update(row.id, { status: 'undelivered', attempts, lastError: message })
      } else {
        await repo.update(row.id, { status: 'failed', attempts, nextAttemptAt: new Date(now.getTime() + wait), lastError: message })
      }
      // Whoever is not reached on one channel is tried on the next while this one retries.
      await queueFallback(row, now)
      logger.warn({ err, notification: row.id, channel: row.channel, attempts }, 'message not sent')
      failed++
    }
  }
  if (channels.text) await sendStormSummaries(channels.text, config.sms.maxPerHour, config.publicUrl)
  return { sent, failed }
}

/** Where a message points: the task, or the incident when a hand-filed incident's alert has no task; null when that is gone. */
function subjectOf(alert: AlertRow, task: TaskRow | null, cat: Awaited<ReturnType<typeof loadCatalogue>>): { label: string; path: string } | null {
  if (task) return { label: targetLabel(task.targetKind, task.targetId, cat), path: `/tasks/${task.id}` }
  if (alert.taskId === null && alert.incidentId !== null) return { label: `Incident #${alert.incidentId}`, path: `/incidents/${alert.incidentId}` }
  return null
}

async function sendOne(row: NotificationRow, c: Context): Promise<Outcome> {
  const link = `${c.config.publicUrl}${c.path}`
  const input = { alert: c.alert, task: c.task, step: row.step, now: c.now, targetLabel: c.label, link }
  const token = signAckToken(c.config.ackSecret, row.id, new Date(c.now.getTime() + c.config.mail.ackTtlHours * 3_600_000))
  if (row.channel === 'email') {
    const message = composeMessage({ ...input, ackUrl: `${c.config.publicUrl}/ack/${token}` })
    await c.transport.sendMail({ from: c.config.mail.from, to: row.email, subject: message.subject, text: message.text, html: message.html })
    return { status: 'sent', subject: message.subject }
  }
  const subject = composeMessage({ ...input, ackUrl: '' }).subject
  if (row.channel === 'sms') {
    if (!c.channels.text) return { status: 'undelivered', subject, note: 'Text messages are not set up on this server' }
    if (!row.destination) return { status: 'undelivered', subject, note: 'No mobile number on file' }
    if (!(await takeTextSlot(row.personId, c.now, c.config.sms.maxPerHour))) {
      return {
        status: 'suppressed',
        subject,
        note: `Not texted: ${c.config.sms.maxPerHour} texts an hour already went to this person; counted in one summary text`,
      }
    }
    const replyCode = String(randomInt(1000, 10_000))
    const message = await c.channels.text.send(row.destination, composeText({ ...input, replyCode }))
    return { status: 'sent', subject, providerId: message.sid, providerStatus: message.status, replyCode }
  }
  if (!c.channels.push) return { status: 'undelivered', subject, note: 'Push notifications are not set up on this server' }
  // The same single-use acknowledge token as the mail link; the notification's action posts it.
  const body = composeMessage({ ...input, ackUrl: '' }).text.split('\n')[0]
  const pushed = await sendPushAlert(c.channels.push, row, {
    title: subject,
    body,
    tag: `alert-${c.alert.id}`,
    url: c.path,
    ackUrl: `/ack/${token}`,
  })
  return pushed.status === 'sent' ? { status: 'sent', subject, providerId: pushed.providerId ?? undefined } : { ...pushed, subject }
}

export type { NotificationRow }
