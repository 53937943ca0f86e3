import { In, Not } from 'typeorm'
import { db } from '../../db/data-source'
import { recordBulkTaskChange, recordTaskChanges } from '../../realtime/change-outbox'
import { TaskEntity, type TaskRow } from './task.entity'

/** The task row other modules build and read; they never touch the entity itself. */
export type { TaskRow }
/** What a new task states; the database fills in the rest. */
export type NewTask = Partial<Omit<TaskRow, 'id' | 'createdAt' | 'updatedAt'>>

const tasks = () => db().getRepository(TaskEntity)
const FINISHED = ['done', 'skipped'] as const

/**
 * Task writes other modules ask for (record 13c): each goes through `db()`, so it commits with
 * the change that caused it, and each notes the change for the live feed.
 */
export async function createTask(fields: NewTask): Promise<TaskRow> {
  const saved = await tasks().save(tasks().create(fields))
  await recordTaskChanges([saved.id])
  return saved
}

export interface Closing {
  outcome: 'done' | 'skipped'
  flag: TaskRow['flag']
  lateMinutes: number | null
  completedAt: Date
  completedById: number
  assigneeId: number
}

/**
 * Closes a task if it is still the version the person saw and nobody finished it meanwhile (one
 * winner when two complete it at once); answers whether this call closed it.
 */
export async function closeTask(task: Pick<TaskRow, 'id' | 'version'>, closing: Closing): Promise<boolean> {
  const { outcome, ...fields } = closing
  const claimed = await db()
    .createQueryBuilder()
    .update(TaskEntity)
    .set({ ...fields, status: outcome, version: () => 'version + 1' })
    .where('id = :id AND version = :version', { id: task.id, version: task.version })
    .andWhere("status NOT IN ('done', 'skipped')")
    .execute()
  if (claimed.affected) await recordTaskChanges([task.id])
  return !!claimed.affected
}

/** A finished task's flag after its readings were corrected and judged again (an amendment). */
export async function reflagTask(taskId: number, flag: TaskRow['flag']): Promise<void> {
  const changed = await tasks().update({ id: taskId, status: In([...FINISHED]) }, { flag, version: () => 'version + 1' })
  if (changed.affected) await recordTaskChanges([taskId])
}

/** The recheck raised after this task, if any. */
export const recheckOf = (taskId: number) => tasks().findOneBy({ recheckOfTaskId: taskId })

/** The task with this id while nobody has finished it yet, else null. */
export const openTask = (id: number) => tasks().findOneBy({ id, status: Not(In([...FINISHED])) })

/** An event's planned tasks, in statements of 500. */
export async function createEventTasks(rows: NewTask[]) {
  for (let i = 0; i < rows.length; i += 500) await tasks().insert(rows.slice(i, i + 500))
  if (rows.length) await recordBulkTaskChange('event')
}

export const eventTasks = (eventId: number) => tasks().find({ where: { eventId } })
export const countEventTasks = (eventId: number) => tasks().countBy({ eventId })

/** An event's tasks nobody has started, assigned by hand or edited. */
export async function removeUntouchedEventTasks(eventId: number) {
  const result = await db()
    .createQueryBuilder()
    .delete()
    .from(TaskEntity)
    .where({ eventId, status: In(['planned', 'open', 'overdue']) })
    .andWhere('assignedManually = 0 AND edited = 0 AND completedAt IS NULL')
    .execute()
  if (result.affected) await recordBulkTaskChange('event')
}

export interface FeedWindow {
  tankIds: number[]
  reason: string
}

/** Feeding tasks of these tanks due in [from, to) go `held` with the reason (fasting, record 011). */
export async function holdFeeds({ tankIds, reason }: FeedWindow, from: Date, to: Date): Promise<number> {
  const result = await db()
    .createQueryBuilder()
    .update(TaskEntity)
    .set({ status: 'held', heldReason: reason, version: () => 'version + 1' })
    .where({ category: 'feeding', tankId: In(tankIds), status: In(['planned', 'open', 'overdue']) })
    .andWhere('dueAt >= :from AND dueAt < :to', { from, to })
    .andWhere('eventId IS NULL')
    .execute()
  if (result.affected) await recordBulkTaskChange('fasting')
  return result.affected ?? 0
}

/** Feeds held for this reason and due after `after` go back to planned. */
export async function releaseFeeds({ tankIds, reason }: FeedWindow, after: Date): Promise<number> {
  const result = await db()
    .createQueryBuilder()
    .update(TaskEntity)
    .set({ status: 'planned', heldReason: null, version: () => 'version + 1' })
    .where({ status: 'held', category: 'feeding', tankId: In(tankIds) })
    .andWhere('dueAt > :now', { now: after })
    .andWhere('heldReason = :reason', { reason })
    .execute()
  if (result.affected) await recordBulkTaskChange('fasting')
  return result.affected ?? 0
}
