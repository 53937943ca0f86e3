import { Between } from 'typeorm'
import { db } from '../../db/data-source'
import { loadCatalogue } from '../facility/facility-catalogue'
import { listStaff } from '../people/people.service'
import { assigneeRulesOf } from '../routines/routine-planning'
import { tasksForAssigneeRules } from '../tasks/task-queries'
import { assignByRule, type TaskRow } from '../tasks/task-writes.service'
import { OnCallEntity, ShiftEntity, type ShiftRow } from './roster.entities'

const minutes = (hhmm: string) => Number(hhmm.slice(0, 2)) * 60 + Number(hhmm.slice(3, 5))
const covers = (s: ShiftRow, hhmm: string) => {
  const start = minutes(s.start)
  const end = minutes(s.end) <= start ? minutes(s.end) + 1440 : minutes(s.end)
  return start <= minutes(hhmm) && minutes(hhmm) < end
}

/**
 * Applies routines' default assignee rules to tasks between two facility dates: a named
 * person, whoever of a role is on shift at the task's time (each person gets a contiguous
 * stretch of the walking order), or whoever is on call then. Tasks a supervisor assigned by
 * hand, and finished ones, are never touched.
 */
export async function applyAssigneeRules(from: string, to: string, opts: { routineIds?: number[] } = {}): Promise<number> {
  const tasks = await tasksForAssigneeRules(from, to, opts.routineIds)
  const withRoutine = tasks.filter((t) => t.routineId !== null)
  if (!withRoutine.length) return 0
  const routines = await assigneeRulesOf([...new Set(withRoutine.map((t) => t.routineId!))])
  const [shifts, duties, people, cat] = await Promise.all([
    db()
      .getRepository(ShiftEntity)
      .find({ where: { date: Between(from, to) } }),
    db().getRepository(OnCallEntity).find(),
    listStaff(),
    loadCatalogue(),
  ])
  const roleOf = new Map(people.map((p) => [p.id, p.role]))
  const areaRank = new Map(
    [...cat.areas.values()].sort((a, b) => Number(a.quarantine) - Number(b.quarantine) || a.roundOrder - b.roundOrder).map((a, i) => [a.id, i]),
  )
  const walkKey = (t: TaskRow) => `${String(areaRank.get(t.areaId ?? -1) ?? 99).padStart(3, '0')}|${t.targetKind}|${String(t.targetId).padStart(8, '0')}`

  // Each day's distinct stops in walking order, so each person gets a contiguous stretch.
  const stopsByDate = new Map<string, Map<string, number>>()
  for (const date of new Set(withRoutine.map((t) => t.localDate))) {
    const stops = [...new Set(withRoutine.filter((t) => t.localDate === date).map(walkKey))].sort()
    stopsByDate.set(date, new Map(stops.map((k, i) => [k, i])))
  }
  const updates = new Map<number, number | null>()
  for (const task of withRoutine) {
    const rule = routines.get(task.routineId!)
    if (!rule || rule.kind === 'none') continue
    let assignee: number | null = null
    if (rule.kind === 'person') assignee = roleOf.has(rule.personId) ? rule.personId : null
    else if (rule.kind === 'on_call') {
      assignee = duties.filter((d) => d.startsAt <= task.dueAt && d.endsAt > task.dueAt).sort((a, b) => +b.startsAt - +a.startsAt)[0]?.personId ?? null
    } else {
      const time = task.localStart.slice(11, 16)
      const candidates = [
        ...new Set(shifts.filter((s) => s.date === task.localDate && covers(s, time) && roleOf.get(s.personId) === rule.role).map((s) => s.personId)),
      ].sort((a, b) => a - b)
      if (candidates.length) {
        const stops = stopsByDate.get(task.localDate)!
        const index = stops.get(walkKey(task))!
        assignee = candidates[Math.min(candidates.length - 1, Math.floor((index * candidates.length) / stops.size))]
      }
    }
    if (assignee !== task.assigneeId) updates.set(task.id, assignee)
  }
  await assignByRule(updates)
  return updates.size
}
