import { DateTime } from 'luxon'
import { expandRuleBounded, type Occurrence } from '#shared/schedule/expand-rule'
import { RULE_LIMITS } from '#shared/schedule/rule-limits'
import type { Routine } from '#shared/schemas/routine'
import { recordBulkTaskChange } from '../../realtime/change-outbox'
import { eventLoopSlices } from '../../lib/event-loop-slices'
import { logger } from '../../lib/logger'
import { activePersonIds } from '../people/person-reads'
import { holdFeedsForAllEvents } from '../playbooks/fasting'
import { applyAssigneeRules } from '../roster/assignee-rules.service'
import { notePlanningError, routinesToPlan } from '../routines/routine-planning'
import { insertPlannedTasks } from '../tasks/planned-task-writes'
import { loadCatalogue, resolveTargets, type Catalogue } from '../tasks/targets'
import type { TaskRow } from '../tasks/task-writes.service'

export const DEFAULT_HORIZON_DAYS = RULE_LIMITS.horizonDays
// Rows per INSERT: ~400 bytes each, so a statement stays far below max_allowed_packet.
const CHUNK = 2000

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
  const [cat, activePeople] = await Promise.all([loadCatalogue(), activePersonIds()])
  const routines = await routinesToPlan(opts.routineIds)
  // From now on by default: earlier occurrences of a new rule would be born overdue.
  const from = opts.from ?? new Date()
  const until = new Date(from.getTime() + (opts.horizonDays ?? DEFAULT_HORIZON_DAYS) * 86_400_000)
  let created = 0
  // Rows wait in one batch across routines, so small routines share a statement.
  let batch: Array<Partial<TaskRow>> = []
  const pause = eventLoopSlices()
  for (const [index, routine] of routines.entries()) {
    let rows: Array<Partial<TaskRow>> = []
    try {
      rows = await planRoutineInSlices(routine, cat, { from, until, activePeople, pause })
      if (routine.planningError !== null) await notePlanningError(routine.id, null)
    } catch (err) {
      // One broken routine (say, a date stored before dates were checked) must not stop the
      // planning of every routine after it: it is logged, marked for the routines page, and skipped.
      logger.error({ err, routineId: routine.id }, 'routine could not be planned')
      await notePlanningError(routine.id, planningErrorText(err))
    }
    for (const row of rows) {
      if (opts.tankId !== undefined && row.tankId !== opts.tankId) continue
      batch.push(row)
      if (batch.length === CHUNK) {
        created += await insertPlannedTasks(batch)
        batch = []
      }
    }
    if (index === routines.length - 1 && batch.length) created += await insertPlannedTasks(batch)
    opts.onProgress?.(index + 1, routines.length, created)
    // Planning is synchronous work: give waiting requests their turn between routines.
    await pause()
  }
  if (created) {
    logger.info({ created, routines: routines.length }, 'tasks materialised')
    const zone = cat.facility.timeZone
    // A named person was set while planning; only rules that read the roster need a pass over the tasks.
    const rosterBound = routines.filter((r) => r.assigneeRule.kind === 'on_call' || r.assigneeRule.kind === 'role_on_shift').map((r) => r.id)
    if (rosterBound.length) {
      await applyAssigneeRules(DateTime.fromJSDate(from).setZone(zone).toISODate()!, DateTime.fromJSDate(until).setZone(zone).toISODate()!, {
        routineIds: rosterBound,
      })
    }
    // New feeding tasks may fall inside a planned event's fasting window.
    await holdFeedsForAllEvents()
    await recordBulkTaskChange('planned')
  }
  return { created, routines: routines.length }
}

const planningErrorText = (err: unknown) => `Tasks could not be planned: ${err instanceof Error ? err.message : String(err)}`.slice(0, 500)

const WEEK_MS = 7 * 86_400_000

/**
 * The routine's occurrences a week at a time: each expansion stays within its bounded work
 * (RULE_LIMITS) however long the horizon, and a rule validated for the planning horizon fits.
 */
function occurrencesBetween(routine: Routine, zone: string, lower: Date, upper: Date): Occurrence[] {
  const found: Occurrence[] = []
  for (let start = lower.getTime(); start <= upper.getTime(); start += WEEK_MS) {
    const end = Math.min(start + WEEK_MS - 1, upper.getTime())
    const week = expandRuleBounded({
      rrule: routine.rrule,
      dtstart: routine.dtstart,
      tzid: zone,
      from: new Date(start).toISOString(),
      to: new Date(end).toISOString(),
      limit: RULE_LIMITS.maxPerHorizon,
    })
    if (!week.complete) logger.warn({ routineId: routine.id, from: new Date(start).toISOString() }, 'rule expansion stopped at its work limit')
    found.push(...week.occurrences)
  }
  return found
}

/**
 * planRoutineTasks a week at a time, pausing between weeks: a routine at the density limit (a
 * task every 15 minutes) on 20 tanks is 80,000 rows, a quarter of a second of work in one piece.
 */
async function planRoutineInSlices(
  routine: Routine,
  cat: Catalogue,
  span: { from: Date; until: Date; activePeople: ReadonlySet<number>; pause: () => Promise<void> },
): Promise<Array<Partial<TaskRow>>> {
  const rows: Array<Partial<TaskRow>> = []
  for (let start = span.from.getTime(); start <= span.until.getTime(); start += WEEK_MS) {
    const end = new Date(Math.min(start + WEEK_MS - 1, span.until.getTime()))
    for (const row of planRoutineTasks(routine, cat, new Date(start), end, span.activePeople)) rows.push(row)
    await span.pause()
  }
  return rows
}

function localDay(date: string, zone: string) {
  const day = DateTime.fromISO(date, { zone })
  if (!day.isValid) throw new Error(`${date} is not a calendar date (${day.invalidExplanation ?? day.invalidReason})`)
  return day
}

/** The task rows one routine should have between two instants, in the facility's zone. */
export function planRoutineTasks(routine: Routine, cat: Catalogue, from: Date, until: Date, activePeople?: ReadonlySet<number>): Array<Partial<TaskRow>> {
  const zone = cat.facility.timeZone
  const startOfDay = (d: string) => localDay(d, zone).startOf('day').toJSDate()
  const endOfDay = (d: string) => localDay(d, zone).endOf('day').toJSDate()
  const lower = routine.activeFrom ? new Date(Math.max(from.getTime(), startOfDay(routine.activeFrom).getTime())) : from
  const upper = routine.activeTo ? new Date(Math.min(until.getTime(), endOfDay(routine.activeTo).getTime())) : until
  if (upper < lower) return []
  const targets = resolveTargets(routine, cat)
  if (!targets.length) return []
  const skip = new Set(routine.skipDates)
  const occurrences = occurrencesBetween(routine, zone, lower, upper)
  // A named person who is no longer active leaves the task unassigned, as the rule pass would.
  const named = routine.assigneeRule.kind === 'person' ? routine.assigneeRule.personId : null
  const assigneeId = named !== null && (!activePeople || activePeople.has(named)) ? named : null
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

/** After a routine is created or changed: its tasks for the horizon, from now. */
export const materialiseRoutine = (routineId: number) => materialise({ routineIds: [routineId], from: new Date() })

export const materialiseForTank = (tankId: number) => materialise({ tankId, from: new Date() })
