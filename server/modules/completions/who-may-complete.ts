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
