import { In } from 'typeorm'
import { db } from '../../db/data-source'
import { stepChannels } from '#shared/schemas/ladder'
import { acknowledgeOpenAlert, closeAlert, openAlertsStartedBy, type AlertRow } from '../completions/alert-records'
import { getFacility } from '../facility/facility.service'
import { incidentOwner } from '../incidents/incident-lookups'
import { taskRowsByIds, type TaskRow } from '../tasks/task-queries'
import { recheckOf } from '../tasks/task-writes.service'
import { NotificationEntity } from './escalation.entities'
import { ladderFor } from './ladders.service'
import { channelsFor, destinationFor } from './channels'
import { inQuietHours, onCallHolder, quietHoursEnd, resolveRecipients } from './recipients'

export const isUrgent = (alert: AlertRow, task: TaskRow | null) => alert.kind === 'critical_reading' || task?.priority === 'welfare_critical'

/**
 * Climbs every open ladder one tick: closes alerts whose task was answered, and queues the
 * messages of the step now due. After downtime, when several steps fell due together, only
 * the latest is sent, so nobody gets a burst of stale messages.
 */
export async function runEscalations(now: Date): Promise<{ queued: number; closed: number }> {
  const alerts = await openAlertsStartedBy(now)
  if (!alerts.length) return { queued: 0, closed: 0 }
  const zone = (await getFacility()).timeZone
  const tasks = new Map((await taskRowsByIds(alerts.flatMap((a) => a.taskId ?? []))).map((t) => [t.id, t]))
  let queued = 0
  let closed = 0
  for (const alert of alerts) {
    const task = alert.taskId === null ? null : (tasks.get(alert.taskId) ?? null)
    // An incident filed by hand has no task: its alert answers to the incident, and "assignee" means who filed it.
    const owner = alert.taskId === null && alert.incidentId !== null ? await incidentOwner(alert.incidentId) : null
    if (task ? await answered(alert, task) : !owner) {
      await closeAlert(alert.id, now)
      closed++
      continue
    }
    const ladder = await ladderFor(alert, task)
    const reached = await db()
      .getRepository(NotificationEntity)
      .createQueryBuilder('n')
      .select('MAX(n.step)', 'max')
      .where('n.alertId = :id', { id: alert.id })
      .getRawOne<{ max: number | null }>()
    const highest = reached?.max ?? -1
    const dueSteps = ladder.steps
      .map((s, i) => ({ ...s, i }))
      .filter((s) => s.i > highest && alert.startedAt.getTime() + s.afterMinutes * 60_000 <= now.getTime())
    const step = dueSteps.at(-1)
    if (!step) continue
    const people = await resolveRecipients(step.notify, { assigneeId: task ? task.assigneeId : (owner?.filedById ?? null) }, now, zone)
    const holder = await onCallHolder(now)
    const urgent = isUrgent(alert, task)
    const rows = people.flatMap((p) => {
      // The on-call holder is reached by every channel they enabled, quiet hours or not.
      const onCall = p.id === holder
      const held = !urgent && !onCall && inQuietHours(p, now, zone)
      const nextAttemptAt = held ? quietHoursEnd(p, now, zone) : now
      return channelsFor(p, stepChannels(step), onCall).map((channel) => ({
        alertId: alert.id,
        step: step.i,
        personId: p.id,
        channel,
        email: p.email,
        destination: destinationFor(p, channel),
        subject: '',
        status: held ? ('held' as const) : ('pending' as const),
        urgent,
        attempts: 0,
        nextAttemptAt,
      }))
    })
    // Record the step even when nobody matched, so the ladder moves on instead of retrying it.
    const values = rows.length
      ? rows
      : [
          {
            alertId: alert.id,
            step: step.i,
            personId: 0,
            channel: 'email' as const,
            email: '',
            destination: null,
            subject: 'Nobody to notify at this step',
            status: 'superseded' as const,
            urgent,
            attempts: 0,
            nextAttemptAt: now,
          },
        ]
    const result = await db().getRepository(NotificationEntity).createQueryBuilder().insert().values(values).orIgnore().execute()
    queued += rows.length ? result.identifiers.filter(Boolean).length || rows.length : 0
  }
  return { queued, closed }
}

/** A missed task that was done after all, or a critical reading whose recheck came back out of critical. */
async function answered(alert: AlertRow, task: TaskRow): Promise<boolean> {
  if (alert.kind === 'missed_task') return task.status === 'done' || task.status === 'skipped'
  // An overdue incident's alert is closed by the incident when its deadline is met, or acknowledged.
  if (alert.kind !== 'critical_reading') return false
  const recheck = await recheckOf(task.id)
  return !!recheck && recheck.status === 'done' && recheck.flag !== 'critical'
}

/** Acknowledging in the app or through a mail link stops the ladder and records who answered. */
export async function acknowledgeAlert(alertId: number, personId: number, at = new Date()): Promise<boolean> {
  const first = await acknowledgeOpenAlert(alertId, personId, at)
  await db()
    .getRepository(NotificationEntity)
    .update({ alertId, status: In(['pending', 'held', 'failed']) }, { status: 'superseded' })
  return first
}
