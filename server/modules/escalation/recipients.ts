import { DateTime } from 'luxon'
import type { Recipient } from '#shared/schemas/ladder'
import { listContacts, type Contact } from '../people/contact.service'
import { listShifts, onCallAt } from '../roster/roster.service'
import type { TaskRow } from '../tasks/task-queries'

const minutes = (hhmm: string) => Number(hhmm.slice(0, 2)) * 60 + Number(hhmm.slice(3, 5))

/** The people a ladder step reaches at a given moment: on call and on shift are read at that moment. */
export async function resolveRecipients(recipients: Recipient[], task: Pick<TaskRow, 'assigneeId'>, at: Date, zone: string): Promise<Contact[]> {
  const people = (await listContacts()).filter((p) => p.active)
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
      const shifts = await listShifts(local.minus({ days: 1 }).toISODate()!, local.toISODate()!)
      for (const s of shifts) {
        const start = minutes(s.start)
        const end = minutes(s.end) <= start ? minutes(s.end) + 1440 : minutes(s.end)
        const t = s.date === local.toISODate() ? now : now + 1440
        if (start <= t && t < end) chosen.add(s.personId)
      }
    }
  }
  return [...chosen].map((id) => byId.get(id)).filter((p): p is Contact => !!p)
}

/** Who holds the on-call duty at that moment (the latest-starting duty that covers it). */
export async function onCallHolder(at: Date): Promise<number | null> {
  return (await onCallAt(at))?.personId ?? null
}

/** Routine mail waits during a person's quiet hours (which may run past midnight). */
export function inQuietHours(person: Pick<Contact, 'quietStart' | 'quietEnd'>, at: Date, zone: string): boolean {
  if (!person.quietStart || !person.quietEnd) return false
  const local = DateTime.fromJSDate(at).setZone(zone)
  const now = local.hour * 60 + local.minute
  const start = minutes(person.quietStart)
  const end = minutes(person.quietEnd)
  return start <= end ? now >= start && now < end : now >= start || now < end
}

/** When a person's quiet hours end next, as an instant. */
export function quietHoursEnd(person: Pick<Contact, 'quietStart' | 'quietEnd'>, at: Date, zone: string): Date {
  const local = DateTime.fromJSDate(at).setZone(zone)
  const [h, m] = (person.quietEnd ?? '00:00').split(':').map(Number)
  let end = local.set({ hour: h, minute: m, second: 0, millisecond: 0 })
  if (end <= local) end = end.plus({ days: 1 })
  return end.toJSDate()
}
