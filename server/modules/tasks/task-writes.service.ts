import { In, Not } from 'typeorm'
import { db } from '../../db/data-source'
import { execute } from '../../db/prepared'
import type { TaskStatus } from '#shared/schemas/task'
import { recordBulkTaskChange, recordTaskChanges } from '../../realtime/change-outbox'
import { TaskEntity, type TaskRow } from './task.entity'
import { UNTOUCHED_TASK } from './untouched'

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
  const { outcome, flag, lateMinutes, completedAt, completedById, assigneeId } = closing
  // A prepared statement on the hot path of every completion (record 16h); updatedAt as TypeORM's update sets it.
  const claimed = await execute<{ affectedRows: number }>(
    'UPDATE tasks SET status = ?, flag = ?, lateMinutes = ?, completedAt = ?, completedById = ?, assigneeId = ?, ' +
      "version = version + 1, updatedAt = CURRENT_TIMESTAMP(3) WHERE id = ? AND version = ? AND status NOT IN ('done', 'skipped')",
    [outcome, flag, lateMinutes, completedAt, completedById, assigneeId, task.id, task.version],
  )
  if (claimed.affectedRows) await recordTaskChanges([task.id])
  return !!claimed.affectedRows
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
    .andWhere(UNTOUCHED_TASK)
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

interface StatusStep {
  to: TaskStatus
  from: TaskStatus[]
  column: 'windowStartAt' | 'dueAt' | 'graceUntil'
}

// planned → open when the window opens; → overdue at the due time; → missed after the grace.
// Held (fasting), done and skipped tasks never move. Latest step first, so a task whose grace
// passed while the server was away goes straight to missed.
const STATUS_STEPS: StatusStep[] = [
  { to: 'missed', from: ['planned', 'open', 'overdue'], column: 'graceUntil' },
  { to: 'overdue', from: ['planned', 'open'], column: 'dueAt' },
  { to: 'open', from: ['planned'], column: 'windowStartAt' },
]

/**
 * The status clock's moves: every task whose time has come takes its next status (one read and
 * one update per step), and the changes go to the outbox once. Answers what moved and what went
 * missed, for the clock's alerts.
 */
export async function advanceDueTasks(now: Date): Promise<{ changed: number[]; missed: number[] }> {
  const changed: number[] = []
  const missed: number[] = []
  for (const step of STATUS_STEPS) {
    const due = await tasks()
      .createQueryBuilder('t')
      .select('t.id', 'id')
      .where(`t.${step.column} <= :now`, { now })
      .andWhere('t.status IN (:...from)', { from: step.from })
      .getRawMany<{ id: number }>()
    if (!due.length) continue
    const ids = due.map((d) => Number(d.id))
    await tasks()
      .createQueryBuilder()
      .update()
      .set({ status: step.to, version: () => 'version + 1' })
      .where({ id: In(ids), status: In(step.from) })
      .execute()
    changed.push(...ids)
    if (step.to === 'missed') missed.push(...ids)
  }
  await recordTaskChanges(changed)
  return { changed, missed }
}

/**
 * Sets the assignee a routine's rule chose (task id → person or nobody), one statement per
 * person and 1,000 tasks; a task a supervisor assigned by hand meanwhile keeps its person.
 */
export async function assignByRule(assignments: ReadonlyMap<number, number | null>): Promise<void> {
  const byAssignee = new Map<number | null, number[]>()
  for (const [id, assigneeId] of assignments) {
    const ids = byAssignee.get(assigneeId) ?? []
    ids.push(id)
    byAssignee.set(assigneeId, ids)
  }
  for (const [assigneeId, ids] of byAssignee) {
    for (let i = 0; i < ids.length; i += 1000) {
      await tasks().update({ id: In(ids.slice(i, i + 1000)), assignedManually: false }, { assigneeId, version: () => 'version + 1' })
    }
  }
  await recordTaskChanges([...assignments.keys()], 'assignees')
}
