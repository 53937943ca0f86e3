import type { Recipient } from '#shared/schemas/ladder'
import { db } from '../../db/data-source'
import { PersonEntity, type PersonRow } from '../people/person.entity'
import { OnCallEntity, ShiftEntity } from '../roster/roster.entities'
import type { TaskRow } from '../tasks/task.entity'
import { DateTime } from 'luxon'
import { LessThanOrEqual, MoreThan } from 'typeorm'

const minutes = (hhmm: string) => Number(hhmm.slice(0, 2)) * 60 + Number(hhmm.slice(3, 5))

/** The people a ladder step reaches at a given moment: on call and on shift are read at that moment. */
export async function resolveRecipients(recipients: Recipient[], task: TaskRow, at: Date, zone: string): Promise<PersonRow[]> {
  const people = await db().getRepository(PersonEntity).find({ where: { active: true } })
  const byId = new Map(people.map((p) => [p.id, p]))
  const chosen = new Set<number>()
  for (const r of recipients) {
    if (r.kind === 'assignee' && task.assigneeId) chosen.add(task.assigneeId)
    if (r.kind === 'person') chosen.add(r.personId)
    if (r.kind === 'supervisors') people.filter((p) => p.role === 'supervisor').forEach((p) => chosen.add(p.id))
    if (r.kind === 'managers') people.filter((p) => p.role === 'manager').forEach((p) => chosen.add(p.id))
    if (r.kind === 'on_call') {
      const holder = await onCallHolder(at)
      if (holder) chosen.add(holder)
    }
    if (r.kind === 'on_shift') {
      const local = DateTime.fromJSDate(at).setZone(zone)
      const now = local.hour * 60 + local.minute
      const shifts = await db().getRepository(ShiftEntity).find({ where: [{ date: local.toISODate()! }, { date: local.minus({ days: 1 }).toISODate()! }] })
      for (const s of shifts) {
        const start = minutes(s.start)
        const end = minutes(s.end) <= start ? minutes(s.end) + 1440 : minutes(s.end)
        const t = s.date === local.toISODate() ? now : now + 1440
        if (start <= t && t < end) chosen.add(s.personId)
      }
    }
  }
  return [...chosen].map((id) => byId.get(id)).filter((p): p is PersonRow => !!p)
}

/** Who holds the on-call duty at that moment (the latest-starting duty that covers it). */
export async function onCallHolder(at: Date): Promise<number | null> {
  const duty = await db().getRepository(OnCallEntity).findOne({ where: { startsAt: LessThanOrEqual(at), endsAt: MoreThan(at) }, order: { startsAt: 'DESC' } })
  return duty?.personId ?? null
}

/** Routine mail waits during a person's quiet hours (which may run past midnight). */
export function inQuietHours(person: Pick<PersonRow, 'quietStart' | 'quietEnd'>, at: Date, zone: string): boolean {
  if (!person.quietStart || !person.quietEnd) return false
  const local = DateTime.fromJSDate(at).setZone(zone)
  const now = local.hour * 60 + local.minute
  const start = minutes(person.quietStart)
  const end = minutes(person.quietEnd)
  return start <= end ? now >= start && now < end : now >= start || now < end
}

/** When a person's quiet hours end next, as an instant. */
export function quietHoursEnd(person: Pick<PersonRow, 'quietStart' | 'quietEnd'>, at: Date, zone: string): Date {
  const local = DateTime.fromJSDate(at).setZone(zone)
  const [h, m] = (person.quietEnd ?? '00:00').split(':').map(Number)
  let end = local.set({ hour: h, minute: m, second: 0, millisecond: 0 })
  if (end <= local) end = end.plus({ days: 1 })
  return end.toJSDate()
}
