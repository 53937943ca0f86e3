import { In } from 'typeorm'
import type { AssigneeRule, Routine } from '#shared/schemas/routine'
import { db } from '../../db/data-source'
import { RoutineEntity } from './routine.entity'

/**
 * What other modules read from routines (the planner, the assignee rules, escalation's ladder), and
 * the one thing the planner writes back (why a routine could not be planned), so they never touch
 * the routine entity.
 */
const routines = () => db().getRepository(RoutineEntity)

/** The routines to plan: these ids, or all of them; paused ones are left out. */
export async function routinesToPlan(ids?: number[]): Promise<Routine[]> {
  const rows = ids ? await routines().findBy(ids.map((id) => ({ id }))) : await routines().find()
  return rows.filter((r) => !r.paused)
}

/** Notes why a routine could not be planned (null: it planned fine), for the routines page. */
export async function notePlanningError(routineId: number, error: string | null) {
  await routines().update(routineId, { planningError: error })
}

/** The default assignee rule of each of these routines. */
export async function assigneeRulesOf(ids: number[]): Promise<Map<number, AssigneeRule>> {
  if (!ids.length) return new Map()
  const rows = await routines().find({ select: { id: true, assigneeRule: true }, where: { id: In(ids) } })
  return new Map(rows.map((r) => [r.id, r.assigneeRule]))
}

/** The ladder a routine's missed tasks climb, or null (none chosen, or the routine is gone). */
export async function routineLadderId(routineId: number): Promise<number | null> {
  return (await routines().findOneBy({ id: routineId }))?.ladderId ?? null
}
