import type { ChangeKind } from '#shared/schemas/live'
import { insertRows } from '../db/prepared'
import { ChangeOutboxEntity } from './change-outbox.entity'

const CHUNK = 1000
/** Past this many tasks in one change, one `tasks` row (clients refetch) stands for them all. */
const MAX_TASK_ROWS = 2000

/**
 * Notes that records changed, through `db()`: inside a request or scheduler step the rows commit
 * with the change itself, and the publisher tells the live feed after the commit.
 */
export async function recordChange(kind: ChangeKind, ids: ReadonlyArray<number | string | null> = [null]) {
  const rows = [...new Set(ids)].map((id) => ({ kind, entityId: id === null ? null : String(id) }))
  for (let i = 0; i < rows.length; i += CHUNK) await insertRows(ChangeOutboxEntity, rows.slice(i, i + CHUNK))
}

export async function recordTaskChanges(ids: readonly number[], reason = 'many') {
  if (ids.length > MAX_TASK_ROWS) await recordBulkTaskChange(reason)
  else if (ids.length) await recordChange('task', ids)
}

/** Many tasks changed at once (clients refetch rather than patch); `reason` says why. */
export const recordBulkTaskChange = (reason: string) => recordChange('tasks', [reason])
