import { Between, In } from 'typeorm'
import type { AssigneeRule } from '#shared/schemas/routine'
import { db } from '../../db/data-source'
import { recordTaskChanges } from '../../realtime/change-outbox'
import { PersonEntity } from '../people/person.entity'
import { RoutineEntity } from '../routines/routine.entity'
import { TaskEntity, type TaskRow } from '../tasks/task.entity'
import { loadCatalogue } from '../tasks/targets'
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
  const tasks = await db().getRepository(TaskEntity).find({
    select: { id: true, routineId: true, localDate: true, localStart: true, dueAt: true, areaId: true, targetKind: true, targetId: true, assigneeId: true },
    where: {
      localDate: Between(from, to), assignedManually: false, status: In(['planned', 'open', 'overdue']),
      ...(opts.routineIds ? { routineId: In(opts.routineIds) } : {}),
    },
  })
  const withRoutine = tasks.filter((t) => t.routineId !== null)
  if (!withRoutine.length) return 0
  const routines = new Map((await db().getRepository(RoutineEntity).findBy({ id: In([...new Set(withRoutine.map((t) => t.routineId!))]) })).map((r) => [r.id, r.assigneeRule]))
  const [shifts, duties, people, cat] = await Promise.all([
    db().getRepository(ShiftEntity).find({ where: { date: Between(from, to) } }),
    db().getRepository(OnCallEntity).find(),
    db().getRepository(PersonEntity).find({ where: { active: true } }),
    loadCatalogue(),
  ])
  const roleOf = new Map(people.map((p) => [p.id, p.role]))
  const areaRank = new Map([...cat.areas.values()].sort((a, b) => Number(a.quarantine) - Number(b.quarantine) || a.roundOrder - b.roundOrder).map((a, i) => [a.id, i]))
  const walkKey = (t: TaskRow) => `${String(areaRank.get(t.areaId ?? -1) ?? 99).padStart(3, '0')}|${t.targetKind}|${String(t.targetId).padStart(8, '0')}`

  // Each day's distinct stops in walking order, so each person gets a contiguous stretch.
  const stopsByDate = new Map<string, Map<string, number>>()
  for (const date of new Set(withRoutine.map((t) => t.localDate))) {
    const stops = [...new Set(withRoutine.filter((t) => t.localDate === date).map(walkKey))].sort()
    stopsByDate.set(date, new Map(stops.map((k, i) => [k, i])))
  }
  const updates = new Map<number, number | null>()
  for (const task of withRoutine) {
    const rule = routines.get(task.routineId!) as AssigneeRule | undefined
    if (!rule || rule.kind === 'none') continue
    let assignee: number | null = null
    if (rule.kind === 'person') assignee = roleOf.has(rule.personId) ? rule.personId : null
    else if (rule.kind === 'on_call') {
      assignee = duties.filter((d) => d.startsAt <= task.dueAt && d.endsAt > task.dueAt).sort((a, b) => +b.startsAt - +a.startsAt)[0]?.personId ?? null
    } else {
      const time = task.localStart.slice(11, 16)
      const candidates = [...new Set(shifts.filter((s) => s.date === task.localDate && covers(s, time) && roleOf.get(s.personId) === rule.role).map((s) => s.personId))].sort((a, b) => a - b)
      if (candidates.length) {
        const stops = stopsByDate.get(task.localDate)!
        const index = stops.get(walkKey(task))!
        assignee = candidates[Math.min(candidates.length - 1, Math.floor((index * candidates.length) / stops.size))]
      }
    }
    if (assignee !== task.assigneeId) updates.set(task.id, assignee)
  }
  const byAssignee = new Map<number | null, number[]>()
  for (const [id, assigneeId] of updates) {
    const ids = byAssignee.get(assigneeId) ?? []
    ids.push(id)
    byAssignee.set(assigneeId, ids)
  }
  for (const [assigneeId, ids] of byAssignee) {
    for (let i = 0; i < ids.length; i += 1000) {
      await db().getRepository(TaskEntity).update({ id: In(ids.slice(i, i + 1000)), assignedManually: false }, { assigneeId, version: () => 'version + 1' })
    }
  }
  await recordTaskChanges([...updates.keys()], 'assignees')
  return updates.size
}
