import { randomUUID } from 'node:crypto'
import { db } from '#server/db/data-source'
import { LimitEntity } from '#server/modules/parameters/parameter.entities'
import { TaskEntity, type TaskRow } from '#server/modules/tasks/task.entity'
import { CompletionInputSchema } from '#shared/schemas/completion'
import type { Tank } from '#shared/schemas/facility'

/** One task on a tank, due at `dueAt`, with the readings it needs. */
export async function makeTankTask(tank: Tank, opts: Partial<TaskRow> = {}): Promise<TaskRow> {
  const dueAt = opts.dueAt ?? new Date(Date.now() + 10 * 60_000)
  const repo = db().getRepository(TaskEntity)
  return repo.save(
    repo.create({
      routineId: null,
      eventId: null,
      title: 'Morning tank check',
      category: 'welfare',
      instructions: '',
      priority: 'welfare_critical',
      targetKind: 'tank',
      targetId: tank.id,
      tankId: tank.id,
      areaId: tank.areaId,
      localDate: dueAt.toISOString().slice(0, 10),
      localStart: dueAt.toISOString().slice(0, 19),
      occurrenceStart: dueAt.toISOString().slice(0, 19),
      dueAt,
      windowStartAt: new Date(dueAt.getTime() - 30 * 60_000),
      graceUntil: new Date(dueAt.getTime() + 60 * 60_000),
      durationMinutes: 3,
      status: 'open',
      assigneeId: null,
      assignedManually: false,
      edited: false,
      requiredReadings: ['do_mgL', 'temp_c'],
      version: 1,
      ...opts,
    }),
  )
}

export const completion = (readings: Record<string, number>, extra: Record<string, unknown> = {}) => ({ completionId: randomUUID(), readings, ...extra })
/** The same, parsed as the route parses it, for tests that call the completion service directly. */
export const parsedCompletion = (readings: Record<string, number>, extra: Record<string, unknown> = {}) =>
  CompletionInputSchema.parse(completion(readings, extra))

export async function setSystemLimit(
  systemId: number,
  parameterKey: string,
  bounds: { okMin: number | null; okMax: number | null; criticalMin: number | null; criticalMax: number | null },
) {
  await db()
    .getRepository(LimitEntity)
    .save({ parameterKey, scope: 'system', scopeId: systemId, ...bounds })
}
