import { DateTime } from 'luxon'
import { expandRule } from '#shared/schedule/expand-rule'
import type { Routine } from '#shared/schemas/routine'
import { db } from '../../db/data-source'
import { logger } from '../../lib/logger'
import { holdFeedsForAllEvents } from '../playbooks/fasting'
import { applyAssigneeRules } from '../roster/assignee-rules.service'
import { RoutineEntity } from '../routines/routine.entity'
import { TaskEntity, type TaskRow } from './task.entity'
import { loadCatalogue, resolveTargets, type Catalogue } from './targets'

export const DEFAULT_HORIZON_DAYS = 42
const CHUNK = 1000

export interface MaterialiseOptions {
  routineIds?: number[]
  tankId?: number
  from?: Date
  horizonDays?: number
  onProgress?: (done: number, total: number, created: number) => void
}

/**
 * Keeps tasks materialised for the rolling horizon. Idempotent: the unique key on
 * (routine, target, local start) plus INSERT IGNORE means a second run creates nothing.
 */
export async function materialise(opts: MaterialiseOptions = {}): Promise<{ created: number; routines: number }> {
  const cat = await loadCatalogue()
  const repo = db().getRepository(RoutineEntity)
  const routines = (opts.routineIds ? await repo.findBy(opts.routineIds.map((id) => ({ id }))) : await repo.find()).filter((r) => !r.paused)
  // From now on by default: earlier occurrences of a new rule would be born overdue.
  const from = opts.from ?? new Date()
  const until = new Date(from.getTime() + (opts.horizonDays ?? DEFAULT_HORIZON_DAYS) * 86_400_000)
  let created = 0
  for (const [index, routine] of routines.entries()) {
    const rows = planRoutineTasks(routine, cat, from, until).filter((r) => opts.tankId === undefined || r.tankId === opts.tankId)
    for (let i = 0; i < rows.length; i += CHUNK) {
      created += await insertIgnoringDuplicates(rows.slice(i, i + CHUNK))
    }
    opts.onProgress?.(index + 1, routines.length, created)
  }
  if (created) {
    logger.info({ created, routines: routines.length }, 'tasks materialised')
    const zone = cat.facility.timeZone
    await applyAssigneeRules(DateTime.fromJSDate(from).setZone(zone).toISODate()!, DateTime.fromJSDate(until).setZone(zone).toISODate()!)
    // New feeding tasks may fall inside a planned event's fasting window.
    await holdFeedsForAllEvents()
  }
  return { created, routines: routines.length }
}

/** INSERT IGNORE through the driver, which reports how many rows were really new. */
async function insertIgnoringDuplicates(rows: Array<Partial<TaskRow>>): Promise<number> {
  const [sql, params] = db().createQueryBuilder().insert().into(TaskEntity).values(rows).orIgnore().getQueryAndParameters()
  const result = (await db().query(sql, params)) as { affectedRows?: number }
  return result.affectedRows ?? 0
}

/** The task rows one routine should have between two instants, in the facility's zone. */
export function planRoutineTasks(routine: Routine, cat: Catalogue, from: Date, until: Date): Array<Partial<TaskRow>> {
  const zone = cat.facility.timeZone
  const startOfDay = (d: string) => DateTime.fromISO(d, { zone }).startOf('day').toJSDate()
  const endOfDay = (d: string) => DateTime.fromISO(d, { zone }).endOf('day').toJSDate()
  const lower = routine.activeFrom ? new Date(Math.max(from.getTime(), startOfDay(routine.activeFrom).getTime())) : from
  const upper = routine.activeTo ? new Date(Math.min(until.getTime(), endOfDay(routine.activeTo).getTime())) : until
  if (upper < lower) return []
  const targets = resolveTargets(routine, cat)
  if (!targets.length) return []
  const skip = new Set(routine.skipDates)
  const occurrences = expandRule({ rrule: routine.rrule, dtstart: routine.dtstart, tzid: zone, from: lower.toISOString(), to: upper.toISOString(), limit: 100_000 })
  const assigneeId = routine.assigneeRule.kind === 'person' ? routine.assigneeRule.personId : null
  const rows: Array<Partial<TaskRow>> = []
  for (const occ of occurrences) {
    const localDate = occ.local.slice(0, 10)
    if (skip.has(localDate)) continue
    const due = new Date(occ.utc)
    for (const target of targets) {
      rows.push({
        routineId: routine.id,
        title: routine.name,
        category: routine.category,
        instructions: routine.instructions,
        priority: routine.priority,
        targetKind: target.kind,
        targetId: target.id,
        tankId: target.tankId,
        areaId: target.areaId,
        localDate,
        localStart: occ.local,
        occurrenceStart: occ.local,
        dueAt: due,
        windowStartAt: new Date(due.getTime() - routine.windowBeforeMinutes * 60_000),
        graceUntil: new Date(due.getTime() + routine.graceMinutes * 60_000),
        durationMinutes: routine.durationMinutes,
        status: 'planned',
        assigneeId,
        requiredReadings: routine.requiredReadings,
        version: 1,
      })
    }
  }
  return rows
}

/**
 * Removes future tasks nobody has touched: not started, not manually assigned, not edited.
 * Used when a routine changes or pauses, or a tank is emptied.
 */
export async function removeUntouchedFutureTasks(where: { routineId?: number; tankId?: number }, now = new Date()) {
  const qb = db()
    .createQueryBuilder()
    .delete()
    .from(TaskEntity)
    .where('dueAt > :now', { now })
    .andWhere("status IN ('planned', 'open')")
    .andWhere('assignedManually = 0 AND edited = 0 AND completedAt IS NULL')
  if (where.routineId !== undefined) qb.andWhere('routineId = :routineId', { routineId: where.routineId })
  if (where.tankId !== undefined) qb.andWhere('tankId = :tankId AND routineId IS NOT NULL', { tankId: where.tankId })
  const result = await qb.execute()
  return result.affected ?? 0
}

/** After a routine edit: replace its untouched future tasks with ones from the new rule. */
export async function rematerialiseRoutine(routineId: number) {
  const removed = await removeUntouchedFutureTasks({ routineId })
  const { created } = await materialise({ routineIds: [routineId], from: new Date() })
  return { removed, created }
}

export const materialiseForTank = (tankId: number) => materialise({ tankId, from: new Date() })
