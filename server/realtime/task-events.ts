import type { Task } from '#shared/schemas/task'
import { broadcast } from './socket-server'

export const TASK_EVENTS = ['task:created', 'task:updated'] as const
export type TaskEventName = (typeof TASK_EVENTS)[number]

/** Tells every signed-in screen that a task changed; clients patch their caches from it. */
export function publishTask(event: TaskEventName, task: Task) {
  broadcast(event, task)
}
