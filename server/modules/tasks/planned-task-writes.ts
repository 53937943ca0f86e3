import { db } from '../../db/data-source'
import { recordBulkTaskChange } from '../../realtime/change-outbox'
import { TaskEntity, type TaskRow } from './task.entity'
import { UNTOUCHED_TASK } from './untouched'

/**
 * The writes behind planning (record 13e): scheduling decides which routine tasks should exist,
 * tasks writes them, as it writes every task (record 13c).
 */

// Columns a planned task states; the rest take their defaults.
const INSERT_COLUMNS = [
  'routineId',
  'title',
  'category',
  'instructions',
  'priority',
  'targetKind',
  'targetId',
  'tankId',
  'areaId',
  'localDate',
  'localStart',
  'occurrenceStart',
  'dueAt',
  'windowStartAt',
  'graceUntil',
  'durationMinutes',
  'status',
  'assigneeId',
  'requiredReadings',
  'version',
] as const
const ROW_PLACEHOLDER = `(${INSERT_COLUMNS.map(() => '?').join(',')})`

/**
 * One multi-row INSERT IGNORE, written by hand: the query builder spends longer building a
 * 2,000-row statement than the database spends on it. The unique key on (routine, target, local
 * start) makes a row already planned a no-op; the driver reports the rows really new.
 */
export async function insertPlannedTasks(rows: Array<Partial<TaskRow>>): Promise<number> {
  const params: unknown[] = []
  for (const row of rows) {
    for (const c of INSERT_COLUMNS) params.push(c === 'requiredReadings' ? JSON.stringify(row[c] ?? []) : (row[c] ?? null))
  }
  const sql = `INSERT IGNORE INTO tasks (${INSERT_COLUMNS.map((c) => `\`${c}\``).join(',')}) VALUES ${rows.map(() => ROW_PLACEHOLDER).join(',')}`
  const result = (await db().query(sql, params)) as { affectedRows?: number }
  return result.affectedRows ?? 0
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
    .andWhere(UNTOUCHED_TASK)
  if (where.routineId !== undefined) qb.andWhere('routineId = :routineId', { routineId: where.routineId })
  if (where.tankId !== undefined) qb.andWhere('tankId = :tankId AND routineId IS NOT NULL', { tankId: where.tankId })
  const result = await qb.execute()
  if (result.affected) await recordBulkTaskChange('removed')
  return result.affected ?? 0
}
