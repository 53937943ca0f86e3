import type { Person } from '#shared/schemas/person'
import { forbidden } from '../../lib/errors'
import type { TaskRow } from '../tasks/task-writes.service'

/**
 * Observers never complete; a technician completes their own tasks or unassigned ones
 * (taking them); supervisors and managers may complete any task.
 */
export function assertMayComplete(task: TaskRow, person: Person) {
  if (person.role === 'observer') throw forbidden('Observers can read records but not complete tasks.')
  if (person.role === 'technician' && task.assigneeId !== null && task.assigneeId !== person.id) {
    throw forbidden('This task is assigned to someone else. Ask a supervisor to reassign it to you.')
  }
  if (task.status === 'held') throw forbidden(`This task is on hold: ${task.heldReason ?? 'a fasting window'}.`)
}

/** A finished record is added to or corrected only by the person who did the work, a supervisor or a manager. */
export function assertMayCorrect(doneById: number | null, person: Person) {
  if (person.role === 'observer' || (person.role === 'technician' && doneById !== person.id)) {
    throw forbidden('Only the person who did the work, a supervisor or a manager can add to or correct it.')
  }
}

/**
 * A photo is part of the task's record: while the task is open, whoever may complete it may add
 * one; once it is finished, whoever may correct it (a photo sent just before Done can land
 * after the completion, so the person who did the work keeps the right).
 */
export function assertMayAddPhoto(task: TaskRow, person: Person) {
  if (task.status === 'done' || task.status === 'skipped') return assertMayCorrect(task.completedById, person)
  assertMayComplete(task, person)
}
