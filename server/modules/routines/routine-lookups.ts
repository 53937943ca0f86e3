import { db } from '../../db/data-source'
import { RoutineEntity } from './routine.entity'

/** The ladder a routine's missed tasks climb, or null (none chosen, or the routine is gone). */
export async function routineLadderId(routineId: number): Promise<number | null> {
  return (await db().getRepository(RoutineEntity).findOneBy({ id: routineId }))?.ladderId ?? null
}
