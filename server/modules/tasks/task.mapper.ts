import type { Task } from '#shared/schemas/task'
import type { TaskRow } from './task.entity'
import { targetLabel, type Catalogue } from './targets'

export interface TaskContext {
  cat: Catalogue
  names: ReadonlyMap<number, string>
}

export function toTask(row: TaskRow, ctx: TaskContext): Task {
  return {
    id: row.id,
    routineId: row.routineId,
    eventId: row.eventId,
    title: row.title,
    category: row.category,
    instructions: row.instructions,
    priority: row.priority,
    targetKind: row.targetKind,
    targetId: row.targetId === 0 ? null : row.targetId,
    targetLabel: targetLabel(row.targetKind, row.targetId, ctx.cat),
    tankId: row.tankId,
    areaId: row.areaId,
    localDate: row.localDate,
    localTime: row.localStart.slice(11, 16),
    dueAt: row.dueAt.toISOString(),
    windowStartAt: row.windowStartAt.toISOString(),
    graceUntil: row.graceUntil.toISOString(),
    durationMinutes: row.durationMinutes,
    status: row.status,
    assigneeId: row.assigneeId,
    assigneeName: row.assigneeId ? (ctx.names.get(row.assigneeId) ?? null) : null,
    requiredReadings: row.requiredReadings,
    flag: row.flag,
    lateMinutes: row.lateMinutes,
    completedAt: row.completedAt?.toISOString() ?? null,
    completedById: row.completedById,
    completedByName: row.completedById ? (ctx.names.get(row.completedById) ?? null) : null,
    heldReason: row.heldReason,
    recheckOfTaskId: row.recheckOfTaskId,
    version: row.version,
  }
}
