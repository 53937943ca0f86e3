import type { Limit } from '#shared/schemas/parameter'
import { db } from '../../db/data-source'
import { BatchEntity, SystemEntity, TankEntity } from '../facility/facility.entities'
import { LimitEntity } from '../parameters/parameter.entities'
import type { TaskRow } from '../tasks/task-writes.service'

export interface ReadingContext {
  tankId: number | null
  systemId: number | null
  batchIds: number[]
  salinitySetpoint: number | null
  limits: Limit[]
}

/** Where a task's readings were taken, and which limits apply there. */
export async function readingContextFor(task: TaskRow): Promise<ReadingContext> {
  const tank = task.tankId ? await db().getRepository(TankEntity).findOneBy({ id: task.tankId }) : null
  const systemId = task.targetKind === 'system' ? task.targetId : (tank?.systemId ?? null)
  const system = systemId ? await db().getRepository(SystemEntity).findOneBy({ id: systemId }) : null
  const batches = await db().getRepository(BatchEntity).find()
  const batchIds = batches
    .filter((b) => (b.status === 'active' || b.status === 'quarantine') && ((tank && b.tankIds.includes(tank.id)) || (task.targetKind === 'batch' && b.id === task.targetId)))
    .map((b) => b.id)
  const limits = await db().getRepository(LimitEntity).find()
  return { tankId: tank?.id ?? null, systemId, batchIds, salinitySetpoint: system?.salinitySetpoint ?? null, limits }
}
