import { Between, type EntityManager } from 'typeorm'
import { audit } from '../audit/audit.service'
import { db } from '../../db/data-source'
import { conflict } from '../../lib/errors'
import { recordTaskChanges } from '../../realtime/change-outbox'
import { TaskEntity, type TaskRow } from './task.entity'

/** What a board move may change on a task; scheduling decides it (record 13e), tasks writes it. */
export type TaskMove = Partial<
  Pick<TaskRow, 'assigneeId' | 'assignedManually' | 'localDate' | 'localStart' | 'dueAt' | 'windowStartAt' | 'graceUntil' | 'status' | 'edited'>
>

/**
 * Writes a move if the task is still the version the board saw (409 otherwise). The move, its
 * audit row and its outbox row commit together, or not at all.
 */
export async function writeTaskMove(task: TaskRow, changes: TaskMove): Promise<void> {
  await db().transaction(async (manager: EntityManager) => {
    const result = await manager
      .createQueryBuilder()
      .update(TaskEntity)
      .set({ ...changes, version: () => 'version + 1' })
      .where('id = :id AND version = :version', { id: task.id, version: task.version })
      .execute()
    if (!result.affected) throw conflict('Someone changed this task a moment ago; the board has been refreshed.')
    await audit(
      'assignment',
      task.id,
      'update',
      { assigneeId: task.assigneeId, localDate: task.localDate },
      { assigneeId: changes.assigneeId ?? task.assigneeId, localDate: changes.localDate ?? task.localDate },
    )
    await recordTaskChanges([task.id])
  })
}

/** The same routine's tasks on the same target between two facility dates, inclusive. */
export const routineTasksBetween = (task: Pick<TaskRow, 'routineId' | 'targetKind' | 'targetId'>, from: string, to: string) =>
  db()
    .getRepository(TaskEntity)
    .find({ where: { routineId: task.routineId!, targetKind: task.targetKind, targetId: task.targetId, localDate: Between(from, to) } })
