import { DateTime } from 'luxon'
import type { CalendarDay } from '#shared/schemas/board'
import { getFacility } from '../facility/facility.service'
import { eventsNotCancelled } from '../playbooks/playbook-lookups'
import { taskCountsByDay } from '../tasks/task-queries'
import { listOnCall, listShifts } from './roster.service'

const OPEN = new Set(['planned', 'open', 'overdue'])

/** Per day in a range: task counts by status and category, who is on shift and on call. */
export async function getCalendar(from: string, to: string): Promise<CalendarDay[]> {
  const zone = (await getFacility()).timeZone
  const [counts, shifts, duties, events] = await Promise.all([taskCountsByDay(from, to), listShifts(from, to), listOnCall(from, to), eventsNotCancelled()])
  const days: CalendarDay[] = []
  for (let d = DateTime.fromISO(from, { zone }); d.toISODate()! <= to; d = d.plus({ days: 1 })) {
    const date = d.toISODate()!
    const start = d.startOf('day').toMillis()
    const end = d.plus({ days: 1 }).startOf('day').toMillis()
    const own = counts.filter((c) => c.date === date)
    const sum = (pick: (s: string) => boolean) => own.filter((c) => pick(c.status)).reduce((n, c) => n + Number(c.n), 0)
    const byCategory: Record<string, number> = {}
    for (const c of own) byCategory[c.category] = (byCategory[c.category] ?? 0) + Number(c.n)
    days.push({
      date,
      counts: {
        done: sum((s) => s === 'done'),
        open: sum((s) => OPEN.has(s)),
        missed: sum((s) => s === 'missed'),
        held: sum((s) => s === 'held'),
        skipped: sum((s) => s === 'skipped'),
      },
      byCategory,
      onShift: [...new Set(shifts.filter((s) => s.date === date).map((s) => s.personName))],
      onCall: [...new Set(duties.filter((x) => Date.parse(x.startsAt) < end && Date.parse(x.endsAt) > start).map((x) => x.personName))],
      events: [
        ...events.filter((e) => e.localStart.slice(0, 10) === date).map((e) => ({ id: e.id, title: e.title, kind: e.kind as string })),
        ...events
          .filter((e) => e.fastingFrom && e.fastingTo && e.fastingFrom.getTime() < end && e.fastingTo.getTime() > start)
          .map((e) => ({ id: e.id, title: `Feeding held before ${e.title}`, kind: 'fasting' })),
      ],
    })
  }
  return days
}
