import { z } from 'zod'
import { TaskSchema } from './task'
import { text } from './text'

/**
 * What the server's change outbox records and the live feed names: one task (`task`), many tasks
 * at once (`tasks`: clients refetch their task views), or another kind of record.
 */
export const CHANGE_KINDS = [
  'task',
  'tasks',
  'routine',
  'amendment',
  'catalogue',
  'facility',
  'incident',
  'event',
  'roster',
  'oxygen',
  'stock',
  'parameter',
  'playbook',
] as const
export type ChangeKind = (typeof CHANGE_KINDS)[number]

/** The socket events of the live feed, all sent to the whole facility. */
export const LIVE_EVENTS = {
  /** Changed tasks in full, in batches: clients patch every cached view with them. */
  tasksUpdated: 'tasks:updated',
  /** Too many tasks changed to send (a routine edit, an event, a roster change): refetch task views. */
  tasksChanged: 'tasks:changed',
  /** Other records changed: clients refetch what shows those kinds. */
  dataChanged: 'data:changed',
} as const

export const TasksUpdatedEventSchema = z.object({ tasks: z.array(TaskSchema) })
export type TasksUpdatedEvent = z.infer<typeof TasksUpdatedEventSchema>

export const TasksChangedEventSchema = z.object({ reasons: z.array(text()) })
export type TasksChangedEvent = z.infer<typeof TasksChangedEventSchema>

export const DataChangedEventSchema = z.object({ kinds: z.array(z.enum(CHANGE_KINDS)) })
export type DataChangedEvent = z.infer<typeof DataChangedEventSchema>
