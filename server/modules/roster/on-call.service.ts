import { DateTime } from 'luxon'
import type { HandoverNote, HandoverNoteInput } from '#shared/schemas/roster'
import type { Person } from '#shared/schemas/person'
import { db } from '../../db/data-source'
import { openUnacknowledgedAlerts } from '../completions/alert-records'
import { getFacility } from '../facility/facility.service'
import { findPerson } from '../people/person-reads'
import { flaggedSince, rechecksOf, taskRowsByIds, tasksBetween } from '../tasks/task-queries'
import { toTask } from '../tasks/task.mapper'
import { loadTaskContext } from '../tasks/tasks.service'
import { HandoverNoteEntity } from './roster.entities'
import { listOnCall, onCallAt } from './roster.service'

/** The weekend ahead (or this one, when it is already Saturday or Sunday) in facility days. */
export function weekendOf(today: DateTime): { from: string; to: string } {
  const saturday = today.weekday >= 6 ? today.minus({ days: today.weekday - 6 }) : today.plus({ days: 6 - today.weekday })
  return { from: saturday.toISODate()!, to: saturday.plus({ days: 1 }).toISODate()! }
}

/** What the person holding the phone needs: who and until when, the weekend's work, open flags and alerts, notes. */
export async function getOnCallSummary() {
  const facility = await getFacility()
  const now = new Date()
  const today = DateTime.now().setZone(facility.timeZone)
  const duty = await onCallAt(now)
  const holder = duty ? await findPerson(duty.personId) : null
  const [next] = (await listOnCall(today.toISODate()!, today.plus({ days: 14 }).toISODate()!)).filter((d) => Date.parse(d.startsAt) > now.getTime())
  const weekend = weekendOf(today)
  const ctx = await loadTaskContext()
  const weekendTasks = await tasksBetween(weekend.from, weekend.to)
  const recentFlags = await flaggedSince(new Date(now.getTime() - 3 * 86_400_000))
  const rechecks = await rechecksOf(recentFlags.map((f) => f.id))
  const alerts = await openUnacknowledgedAlerts(50)
  const alertTasks = await taskRowsByIds(alerts.flatMap((a) => a.taskId ?? []))
  return {
    now: duty ? { ...duty, phone: holder?.phone ?? null, email: holder?.email ?? null } : null,
    next: next ?? null,
    weekend: { ...weekend, tasks: weekendTasks.map((t) => toTask(t, ctx)) },
    openFlags: recentFlags.map((f) => ({
      task: toTask(f, ctx),
      recheck: rechecks.find((r) => r.recheckOfTaskId === f.id)
        ? toTask(
            rechecks.find((r) => r.recheckOfTaskId === f.id)!,
            ctx,
          )
        : null,
    })),
    alerts: alerts.map((a) => ({
      id: a.id,
      kind: a.kind,
      detail: a.detail,
      startedAt: a.startedAt.toISOString(),
      task: alertTasks.find((t) => t.id === a.taskId)
        ? toTask(
            alertTasks.find((t) => t.id === a.taskId)!,
            ctx,
          )
        : null,
    })),
    notes: await listHandoverNotes(),
  }
}

export async function listHandoverNotes(): Promise<HandoverNote[]> {
  const rows = await db()
    .getRepository(HandoverNoteEntity)
    .find({ order: { createdAt: 'DESC' }, take: 10 })
  const ctx = await loadTaskContext()
  return rows.map((r) => ({
    id: r.id,
    personId: r.personId,
    personName: ctx.names.get(r.personId) ?? 'Unknown',
    text: r.text,
    createdAt: r.createdAt.toISOString(),
  }))
}

export async function addHandoverNote(person: Person, { text }: HandoverNoteInput): Promise<HandoverNote> {
  const row = await db().getRepository(HandoverNoteEntity).save({ personId: person.id, text })
  return { id: row.id, personId: person.id, personName: person.name, text, createdAt: row.createdAt.toISOString() }
}
