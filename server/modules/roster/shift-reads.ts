import { db } from '../../db/data-source'
import { ShiftEntity } from './roster.entities'

/** Whether the person has a shift on that facility date (a supervisor assigns only people on shift). */
export async function isOnShift(personId: number, date: string): Promise<boolean> {
  return (await db().getRepository(ShiftEntity).countBy({ personId, date })) > 0
}
