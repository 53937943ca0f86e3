import { DateTime } from 'luxon'
import { db } from '../../db/data-source'
import type { AppConfig } from '../../lib/config'
import { alertsOfTasks } from '../completions/alert-records'
import { getFacility } from '../facility/facility.service'
import { listContacts } from '../people/contact.service'
import { tasksBetween } from '../tasks/task-queries'
import { loadCatalogue, targetLabel } from '../tasks/targets'
import { DigestEntity } from './escalation.entities'
import type { Transport } from './deliver'

/**
 * Once a day after the facility's digest time: yesterday's missed tasks, flags and how they
 * were answered, and how many were done late, to every manager. The row keyed by date is
 * claimed first, so only one process sends it.
 */
export async function sendDailyDigestIfDue(config: AppConfig, transport: Transport, now: Date): Promise<boolean> {
  const facility = await getFacility()
  const local = DateTime.fromJSDate(now).setZone(facility.timeZone)
  if (local.toFormat('HH:mm') < facility.digestTime) return false
  const today = local.toISODate()!
  const [sql, params] = db().createQueryBuilder().insert().into(DigestEntity).values({ date: today, sentAt: now }).orIgnore().getQueryAndParameters()
  const claimed = (await db().query(sql, params)) as { affectedRows?: number }
  if (!claimed.affectedRows) return false
  const yesterday = local.minus({ days: 1 }).toISODate()!
  const tasks = await tasksBetween(yesterday, yesterday)
  const missed = tasks.filter((t) => t.status === 'missed')
  const flagged = tasks.filter((t) => t.flag)
  const late = tasks.filter((t) => t.status === 'done' && t.lateMinutes)
  const alerts = await alertsOfTasks(flagged.map((t) => t.id))
  const people = new Map((await listContacts()).map((p) => [p.id, p]))
  const cat = await loadCatalogue()
  const where = (t: (typeof tasks)[number]) => targetLabel(t.targetKind, t.targetId, cat)
  const lines = [
    `Roundtide daily summary for ${yesterday} (${facility.name})`,
    '',
    `Tasks: ${tasks.length}; done ${tasks.filter((t) => t.status === 'done').length}, missed ${missed.length}, skipped ${tasks.filter((t) => t.status === 'skipped').length}, done late ${late.length}.`,
    '',
    'Missed:',
    ...(missed.length ? missed.map((t) => `- ${t.localStart.slice(11, 16)} ${t.title} at ${where(t)}`) : ['- none']),
    '',
    'Flags and how they were answered:',
    ...(flagged.length
      ? flagged.map((t) => {
          const a = alerts.find((x) => x.taskId === t.id)
          const answer = a?.acknowledgedAt
            ? `acknowledged by ${people.get(a.acknowledgedById ?? 0)?.name ?? 'someone'}`
            : a
              ? 'escalated, not acknowledged'
              : 'recheck set'
          return `- ${t.flag?.toUpperCase()} ${t.title} at ${where(t)}: ${answer}`
        })
      : ['- none']),
  ]
  const managers = [...people.values()].filter((p) => p.role === 'manager' && p.active)
  for (const m of managers) {
    await transport.sendMail({
      from: config.mail.from,
      to: m.email,
      subject: `Roundtide daily summary ${yesterday}: ${missed.length} missed, ${flagged.length} flagged`,
      text: lines.join('\n'),
    })
  }
  return true
}
