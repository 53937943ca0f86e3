import { DateTime } from 'luxon'
import { coverageWarnings } from '#shared/roster/coverage'
import type { CoverageWarning } from '#shared/schemas/roster'
import { getFacility } from '../facility/facility.service'
import { tasksStillToDo } from '../tasks/task-queries'
import { loadTaskContext } from '../tasks/tasks.service'
import { listOnCall, listShifts } from './roster.service'

export async function rosterCoverage(from: string, to: string): Promise<CoverageWarning[]> {
  const zone = (await getFacility()).timeZone
  const dates: string[] = []
  for (let d = DateTime.fromISO(from); d <= DateTime.fromISO(to); d = d.plus({ days: 1 })) dates.push(d.toISODate()!)
  const [shifts, duties, rows, ctx] = await Promise.all([listShifts(from, to), listOnCall(from, to), tasksStillToDo(from, to), loadTaskContext()])
  return coverageWarnings({
    dates,
    shifts,
    duties: duties.map((d) => ({ personId: d.personId, startsAt: Date.parse(d.startsAt), endsAt: Date.parse(d.endsAt) })),
    dayRange: (date) => {
      const start = DateTime.fromISO(date, { zone }).startOf('day')
      return [start.toMillis(), start.plus({ days: 1 }).toMillis()] as const
    },
    tasks: rows.map((t) => ({
      id: t.id,
      date: t.localDate,
      time: t.localStart.slice(11, 16),
      title: t.title,
      priority: t.priority,
      assigneeId: t.assigneeId,
      assigneeName: t.assigneeId ? (ctx.names.get(t.assigneeId) ?? null) : null,
    })),
  })
}
