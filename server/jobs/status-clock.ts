import { In, type DataSource, type EntityManager } from 'typeorm'
import type { TaskStatus } from '#shared/schemas/task'
import { AlertEntity } from '../modules/completions/completion.entities'
import { proposeForMissedTasks } from '../modules/incidents/incidents.service'
import { TaskEntity } from '../modules/tasks/task.entity'
import { recordTaskChanges } from '../realtime/change-outbox'

interface Step {
  to: TaskStatus
  from: TaskStatus[]
  column: 'windowStartAt' | 'dueAt' | 'graceUntil'
}

// planned → open when the window opens; → overdue at the due time; → missed after the grace.
// Held (fasting), done and skipped tasks never move.
const STEPS: Step[] = [
  { to: 'missed', from: ['planned', 'open', 'overdue'], column: 'graceUntil' },
  { to: 'overdue', from: ['planned', 'open'], column: 'dueAt' },
  { to: 'open', from: ['planned'], column: 'windowStartAt' },
]

/**
 * Moves every task whose time has come, however long the server was away: a task whose grace
 * passed during downtime goes straight to missed, once, and starts one missed-task alert. The
 * moves, alerts, proposed incidents and outbox rows commit together (joining the caller's
 * transaction when there is one).
 */
export function advanceTaskStatuses(source: DataSource | EntityManager, now: Date): Promise<{ changed: number[]; missed: number[] }> {
  return source.transaction((manager) => advance(manager, now))
}

async function advance(ds: EntityManager, now: Date): Promise<{ changed: number[]; missed: number[] }> {
  const repo = ds.getRepository(TaskEntity)
  const changed: number[] = []
  const missed: number[] = []
  for (const step of STEPS) {
    const due = await repo
      .createQueryBuilder('t')
      .select('t.id', 'id')
      .where(`t.${step.column} <= :now`, { now })
      .andWhere('t.status IN (:...from)', { from: step.from })
      .getRawMany<{ id: number }>()
    if (!due.length) continue
    const ids = due.map((d) => Number(d.id))
    await repo.createQueryBuilder().update().set({ status: step.to, version: () => 'version + 1' }).where({ id: In(ids), status: In(step.from) }).execute()
    changed.push(...ids)
    if (step.to === 'missed') missed.push(...ids)
  }
  if (missed.length) {
    await ds
      .getRepository(AlertEntity)
      .createQueryBuilder()
      .insert()
      .values(missed.map((taskId) => ({ taskId, kind: 'missed_task' as const, detail: 'Not done within its grace time', ladderId: null, startedAt: now })))
      .orIgnore()
      .execute()
    // A missed welfare-critical check is proposed as an incident for a person to confirm or dismiss.
    const critical = await repo.findBy({ id: In(missed), priority: 'welfare_critical' })
    await proposeForMissedTasks(critical, now)
  }
  await recordTaskChanges(changed)
  return { changed, missed }
}
