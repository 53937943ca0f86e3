import { DateTime } from 'luxon'
import { In } from 'typeorm'
import type { ParsedCreateTaskInput, Task, TaskListQuery } from '#shared/schemas/task'
import { db } from '../../db/data-source'
import { findById } from '../../db/prepared'
import { notFound, validationError } from '../../lib/errors'
import { recordTaskChanges } from '../../realtime/change-outbox'
import { personNames } from '../people/person-reads'
import { TaskEntity, type TaskRow } from './task.entity'
import { toTask, type TaskContext } from './task.mapper'
import { loadCatalogue, resolveTargets } from './targets'

const repo = () => db().getRepository(TaskEntity)

/**
 * The catalogue and names that task cards show, from the process's copies (record 16e). Given the
 * rows about to be shown, a copy that lacks one of their tanks or people is loaded again.
 */
export async function loadTaskContext(rows: ReadonlyArray<Pick<TaskRow, 'tankId' | 'assigneeId' | 'completedById'>> = []): Promise<TaskContext> {
  const [cat, names] = await Promise.all([
    loadCatalogue((c) => rows.every((r) => r.tankId === null || c.tanks.has(r.tankId))),
    personNames(rows.flatMap((r) => [r.assigneeId, r.completedById])),
  ])
  return { cat, names }
}

export async function listTasks(query: TaskListQuery): Promise<Task[]> {
  const qb = repo().createQueryBuilder('t')
  if (query.date) qb.where('t.localDate = :date', { date: query.date })
  else qb.where('t.localDate BETWEEN :from AND :to', { from: query.from, to: query.to })
  if (query.areaId) qb.andWhere('t.areaId = :areaId', { areaId: query.areaId })
  if (query.category) qb.andWhere('t.category = :category', { category: query.category })
  if (query.status) qb.andWhere('t.status = :status', { status: query.status })
  if (query.routineId) qb.andWhere('t.routineId = :routineId', { routineId: query.routineId })
  if (query.eventId) qb.andWhere('t.eventId = :eventId', { eventId: query.eventId })
  if (query.tankId) qb.andWhere('t.tankId = :tankId', { tankId: query.tankId })
  if (query.assigneeId === 'none') qb.andWhere('t.assigneeId IS NULL')
  else if (query.assigneeId) qb.andWhere('t.assigneeId = :assigneeId', { assigneeId: query.assigneeId })
  qb.orderBy('t.dueAt', 'ASC').addOrderBy('t.id', 'ASC')
  const [rows, ctx] = await Promise.all([qb.getMany(), loadTaskContext()])
  return rows.map((r) => toTask(r, ctx))
}

/** One task by id: a prepared read, as it starts every completion and move (record 16h). */
export async function getTaskRow(id: number): Promise<TaskRow> {
  const row = await findById(TaskEntity, id)
  if (!row) throw notFound('That task')
  return row
}

export async function getTask(id: number): Promise<Task> {
  const row = await getTaskRow(id)
  return toTask(row, await loadTaskContext([row]))
}

/** Several tasks in one read (the live feed's batches); ids that no longer exist are left out. */
export async function getTasks(ids: readonly number[]): Promise<Task[]> {
  if (!ids.length) return []
  const [rows, ctx] = await Promise.all([repo().find({ where: { id: In([...ids]) }, order: { id: 'ASC' } }), loadTaskContext()])
  return rows.map((r) => toTask(r, ctx))
}

/** A one-off task, outside any routine (e.g. "check the spare pump today"). */
export async function createOneOffTask(data: ParsedCreateTaskInput): Promise<Task> {
  const ctx = await loadTaskContext()
  const zone = ctx.cat.facility.timeZone
  const local = DateTime.fromISO(data.localStart, { zone })
  if (!local.isValid) throw validationError('That start time is not valid.', { localStart: ['Not a valid date and time'] })
  const [target] =
    data.targetKind === 'facility'
      ? resolveTargets({ targetKind: 'facility', targetIds: [], onlyInUse: false }, ctx.cat)
      : resolveTargets({ targetKind: data.targetKind, targetIds: data.targetId ? [data.targetId] : [], onlyInUse: false }, ctx.cat)
  if (!target) throw validationError('That target does not exist.', { targetId: ['Choose an existing target'] })
  const due = local.toJSDate()
  const saved = await repo().save(
    repo().create({
      routineId: null,
      title: data.title,
      category: data.category,
      instructions: data.instructions,
      priority: data.priority,
      targetKind: target.kind,
      targetId: target.id,
      tankId: target.tankId,
      areaId: target.areaId,
      localDate: local.toISODate()!,
      localStart: local.toFormat("yyyy-MM-dd'T'HH:mm:ss"),
      occurrenceStart: local.toFormat("yyyy-MM-dd'T'HH:mm:ss"),
      dueAt: due,
      windowStartAt: new Date(due.getTime() - 30 * 60_000),
      graceUntil: new Date(due.getTime() + data.graceMinutes * 60_000),
      durationMinutes: data.durationMinutes,
      status: 'planned',
      assigneeId: data.assigneeId,
      assignedManually: data.assigneeId !== null,
      requiredReadings: data.requiredReadings,
      version: 1,
    }),
  )
  await recordTaskChanges([saved.id])
  return toTask(saved, ctx)
}
