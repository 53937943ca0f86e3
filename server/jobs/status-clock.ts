import type { DataSource, EntityManager } from 'typeorm'
import { db } from '../db/data-source'
import { AlertEntity } from '../modules/completions/completion.entities'
import { proposeForMissedTasks } from '../modules/incidents/incidents.service'
import { welfareCriticalAmong } from '../modules/tasks/task-queries'
import { advanceDueTasks } from '../modules/tasks/task-writes.service'

/**
 * Moves every task whose time has come, however long the server was away: a task whose grace
 * passed during downtime goes straight to missed, once, and starts one missed-task alert. The
 * moves, alerts, proposed incidents and outbox rows commit together (joining the caller's
 * transaction when there is one); the moves themselves are the tasks module's (record 13c).
 */
export function advanceTaskStatuses(source: DataSource | EntityManager, now: Date): Promise<{ changed: number[]; missed: number[] }> {
  // Inside the transaction `db()` answers its manager, which the task writes use too.
  return source.transaction(() => advance(now))
}

async function advance(now: Date): Promise<{ changed: number[]; missed: number[] }> {
  const { changed, missed } = await advanceDueTasks(now)
  if (missed.length) {
    await db()
      .getRepository(AlertEntity)
      .createQueryBuilder()
      .insert()
      .values(missed.map((taskId) => ({ taskId, kind: 'missed_task' as const, detail: 'Not done within its grace time', ladderId: null, startedAt: now })))
      .orIgnore()
      .execute()
    // A missed welfare-critical check is proposed as an incident for a person to confirm or dismiss.
    await proposeForMissedTasks(await welfareCriticalAmong(missed), now)
  }
  return { changed, missed }
}
