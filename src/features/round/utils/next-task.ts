import type { RoundTask } from '#shared/schemas/round'
import { isFinished } from './group-round'

/**
 * The next task to open after finishing one: the next unfinished task in walking order
 * (wrapping round), skipping held ones, ones waiting in the outbox, and rechecks (they
 * fall due later and are opened on purpose then).
 */
export function nextOpenTask(tasks: RoundTask[], finishedId: number, queuedTaskIds: Set<number>): RoundTask | undefined {
  const at = tasks.findIndex((t) => t.id === finishedId)
  const ordered = at < 0 ? tasks : [...tasks.slice(at + 1), ...tasks.slice(0, at)]
  return ordered.find((t) => t.id !== finishedId && !isFinished(t) && t.status !== 'held' && !queuedTaskIds.has(t.id) && t.recheckOfTaskId === null)
}
