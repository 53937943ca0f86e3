import type { Person } from '#shared/schemas/person'
import type { Task } from '#shared/schemas/task'
import { db } from '../../db/data-source'
import { conflict, forbidden } from '../../lib/errors'
import { recordTaskChanges } from '../../realtime/change-outbox'
import { TaskEntity } from './task.entity'
import { getTask, getTaskRow } from './tasks.service'

/** Taking an unassigned task assigns it to you; someone else's task stays theirs. */
export async function takeTask(taskId: number, person: Person): Promise<Task> {
  if (person.role === 'observer') throw forbidden('Observers cannot take tasks.')
  const task = await getTaskRow(taskId)
  if (task.assigneeId === person.id) return getTask(taskId)
  if (task.assigneeId !== null) throw conflict('Someone else already has this task.')
  const result = await db()
    .createQueryBuilder()
    .update(TaskEntity)
    .set({ assigneeId: person.id, assignedManually: true, version: () => 'version + 1' })
    .where('id = :id AND assigneeId IS NULL', { id: taskId })
    .execute()
  if (!result.affected) throw conflict('Someone else took this task a moment ago.')
  await recordTaskChanges([taskId])
  return getTask(taskId)
}
