// Rows the reliability tests add to the demo facility, written straight to the database by the
// test process (the app processes under test read them like any other rows).
import { randomUUID } from 'node:crypto'
import { DateTime } from 'luxon'
import { In } from 'typeorm'
import { db } from '#server/db/data-source'
import { getFacility } from '#server/modules/facility/facility.service'
import { NotificationEntity, OutboxEntity } from '#server/modules/escalation/escalation.entities'
import { AlertEntity } from '#server/modules/completions/completion.entities'
import { PersonEntity } from '#server/modules/people/person.entity'
import { ShiftEntity } from '#server/modules/roster/roster.entities'
import { TaskEntity, type TaskRow } from '#server/modules/tasks/task.entity'
import type { Tank } from '#shared/schemas/facility'
import { makeAreaWithTanks } from '#tests/support/facility-fixtures'
import { makeTankTask } from '#tests/support/task-fixtures'

export const tag = () => randomUUID().slice(0, 6)

/** Readings inside the demo's ok bands, so a completion raises no flag and no recheck. */
export const OK_READINGS = { do_mgL: 6.8, temp_c: 28.2 }

export async function personIds(): Promise<Record<string, number>> {
  const rows = await db()
    .getRepository(PersonEntity)
    .find({ select: { id: true, email: true } })
  return Object.fromEntries(rows.map((p) => [p.email, p.id]))
}

export async function facilityToday(): Promise<DateTime> {
  return DateTime.now()
    .setZone((await getFacility()).timeZone)
    .startOf('day')
}

/**
 * The first day from `fromDays` after today on which every one of these people has a shift (so
 * they can be assigned). Later than the boards the load reads, so a task pool does not swell them.
 */
export async function dayWithShifts(ids: number[], fromDays = 3): Promise<string> {
  const today = await facilityToday()
  for (let d = fromDays; d <= 28; d++) {
    const date = today.plus({ days: d }).toISODate()!
    const onShift = new Set(
      (
        await db()
          .getRepository(ShiftEntity)
          .find({ where: { date, personId: In(ids) } })
      ).map((s) => s.personId),
    )
    if (ids.every((id) => onShift.has(id))) return date
  }
  throw new Error('No day in the next four weeks has all of these people on shift')
}

/**
 * A pool of unassigned one-off tank checks on `date`, in an area of their own (so the demo's
 * boards and rounds for today keep their usual size). Inserted in bulk; returns the task ids.
 */
export async function makeTaskPool(count: number, date: string, title: string): Promise<{ ids: number[]; tanks: Tank[] }> {
  const { tanks } = await makeAreaWithTanks(8, { roundOrder: 90 })
  const zone = (await getFacility()).timeZone
  const repo = db().getRepository(TaskEntity)
  const rows: Partial<TaskRow>[] = []
  for (let i = 0; i < count; i++) {
    const tank = tanks[i % tanks.length]
    const local = DateTime.fromISO(`${date}T06:00:00`, { zone }).plus({ minutes: Math.floor(i / tanks.length) })
    const dueAt = local.toJSDate()
    const localStart = local.toFormat("yyyy-MM-dd'T'HH:mm:ss")
    rows.push({
      routineId: null,
      eventId: null,
      title,
      category: 'welfare',
      instructions: '',
      priority: 'routine',
      targetKind: 'tank',
      targetId: tank.id,
      tankId: tank.id,
      areaId: tank.areaId,
      localDate: date,
      localStart,
      occurrenceStart: localStart,
      dueAt,
      windowStartAt: new Date(dueAt.getTime() - 30 * 60_000),
      graceUntil: new Date(dueAt.getTime() + 4 * 3_600_000),
      durationMinutes: 3,
      status: 'planned',
      assigneeId: null,
      assignedManually: false,
      edited: false,
      requiredReadings: ['do_mgL', 'temp_c'],
      version: 1,
    })
  }
  for (let i = 0; i < rows.length; i += 500) await repo.insert(rows.slice(i, i + 500) as TaskRow[])
  const ids = (await repo.find({ select: { id: true }, where: { title }, order: { id: 'ASC' } })).map((t) => t.id)
  return { ids, tanks }
}

/**
 * A welfare-critical check assigned to `assigneeId` whose grace ends at `graceUntil` (already
 * overdue), so the scheduler marks it missed then and escalates (urgent: quiet hours do not hold it).
 */
export function overdueTask(tank: Tank, title: string, assigneeId: number, graceUntil: Date): Promise<TaskRow> {
  const dueAt = new Date(graceUntil.getTime() - 60 * 60_000)
  return makeTankTask(tank, {
    title,
    assigneeId,
    status: 'overdue',
    priority: 'welfare_critical',
    dueAt,
    windowStartAt: new Date(dueAt.getTime() - 30 * 60_000),
    graceUntil,
  })
}

export async function freshTanks(count = 2) {
  return (await makeAreaWithTanks(count, { roundOrder: 95 })).tanks
}

/** Every escalation message received for a task (its unique title is in the subject). */
export async function mailsFor(title: string) {
  return (
    await db()
      .getRepository(OutboxEntity)
      .find({ order: { id: 'ASC' } })
  ).filter((m) => m.subject.includes(title))
}

/** The notification rows of a task's alerts (one per alert, step and person). */
export async function notificationsFor(taskId: number) {
  const alerts = await db().getRepository(AlertEntity).findBy({ taskId })
  if (!alerts.length) return []
  return db()
    .getRepository(NotificationEntity)
    .find({ where: { alertId: In(alerts.map((a) => a.id)) }, order: { id: 'ASC' } })
}

export async function taskStatus(id: number) {
  return (await db().getRepository(TaskEntity).findOneByOrFail({ id })).status
}

/**
 * For each recipient of a task's escalation: how many messages the outbox holds and how many
 * notification rows (steps) were sent to them. "Exactly once" means the two are equal and every
 * row was sent once.
 */
export async function deliveryTally(task: { id: number; title: string }) {
  const mails = await mailsFor(task.title)
  const rows = (await notificationsFor(task.id)).filter((n) => n.personId !== 0)
  const byRecipient: Record<string, { messages: number; steps: number[]; statuses: string[] }> = {}
  for (const n of rows) {
    const r = (byRecipient[n.email] ??= { messages: 0, steps: [], statuses: [] })
    r.steps.push(n.step)
    r.statuses.push(n.status)
  }
  for (const m of mails) for (const to of m.to.split(', ')) (byRecipient[to] ??= { messages: 0, steps: [], statuses: [] }).messages++
  return { mails: mails.length, rows: rows.length, byRecipient }
}
