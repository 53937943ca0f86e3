import { In } from 'typeorm'
import type { EscalationRecord } from '#shared/schemas/ladder'
import { db } from '../../db/data-source'
import { forbidden, notFound } from '../../lib/errors'
import { verifyAckToken } from '../../mail/ack-token'
import { alertsOfTask, findAlert } from '../completions/alert-records'
import { findContact, listContacts } from '../people/contact.service'
import { findTaskRow } from '../tasks/task-queries'
import { acknowledgeAlert } from './escalate'
import { NotificationEntity } from './escalation.entities'
import { ladderFor } from './ladders.service'

/** Each alert on a task: the steps sent, to whom, when, whether delivered, and who answered. */
export async function escalationRecord(taskId: number): Promise<EscalationRecord[]> {
  const task = await findTaskRow(taskId)
  if (!task) throw notFound('That task')
  const alerts = await alertsOfTask(taskId)
  if (!alerts.length) return []
  const notes = await db()
    .getRepository(NotificationEntity)
    .find({ where: { alertId: In(alerts.map((a) => a.id)) }, order: { step: 'ASC', id: 'ASC' } })
  const names = new Map((await listContacts()).map((p) => [p.id, p.name]))
  return Promise.all(
    alerts.map(async (a) => ({
      alertId: a.id,
      kind: a.kind,
      detail: a.detail,
      startedAt: a.startedAt.toISOString(),
      acknowledgedAt: a.acknowledgedAt?.toISOString() ?? null,
      acknowledgedByName: a.acknowledgedById ? (names.get(a.acknowledgedById) ?? null) : null,
      closedAt: a.closedAt?.toISOString() ?? null,
      ladderName: (await ladderFor(a, task)).name,
      notifications: notes
        .filter((n) => n.alertId === a.id && n.personId !== 0)
        .map((n) => ({
          step: n.step,
          channel: n.channel,
          personName: names.get(n.personId) ?? n.email,
          email: n.email,
          destination: n.destination ?? n.email,
          providerId: n.providerId,
          providerStatus: n.providerStatus,
          status: n.status,
          attempts: n.attempts,
          sentAt: n.sentAt?.toISOString() ?? null,
          lastError: n.lastError,
        })),
    })),
  )
}

export async function acknowledgeInApp(alertId: number, person: { id: number; role: string }) {
  if (person.role === 'observer') {
    // Observers may sit on a ladder; they answer through their mail link, which names them.
    throw forbidden('Observers acknowledge through the link in their e-mail.')
  }
  const alert = await findAlert(alertId)
  if (!alert) throw notFound('That alert')
  await acknowledgeAlert(alertId, person.id)
}

export type AckOutcome = {
  status: 'acknowledged' | 'already' | 'forged' | 'expired' | 'used' | 'inactive'
  taskId?: number
  /** A hand-filed incident's alert has no task; the page links to the incident instead. */
  incidentId?: number
  byName?: string
}

/** What an acknowledge link does: a forged, expired or already-used token changes nothing. */
export async function acknowledgeByToken(secret: string, token: string, now = new Date()): Promise<AckOutcome> {
  const check = verifyAckToken(secret, token, now)
  if (!check.ok) return { status: check.reason }
  const repo = db().getRepository(NotificationEntity)
  const row = await repo.findOneBy({ id: check.notificationId })
  if (!row) return { status: 'forged' }
  // A link mailed to someone who has since left must not silence an escalation in their name.
  const person = await findContact(row.personId)
  if (!person?.active) return { status: 'inactive' }
  const claimed = await repo.createQueryBuilder().update().set({ ackUsedAt: now }).where('id = :id AND ackUsedAt IS NULL', { id: row.id }).execute()
  if (!claimed.affected) return { status: 'used' }
  const alert = await findAlert(row.alertId)
  // Alerts are never deleted, so a notification always has one; this only guards the type.
  if (!alert) throw notFound('That alert')
  const first = await acknowledgeAlert(alert.id, row.personId, now)
  return { status: first ? 'acknowledged' : 'already', taskId: alert.taskId ?? undefined, incidentId: alert.incidentId ?? undefined, byName: person.name }
}
