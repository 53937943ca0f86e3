import { DateTime } from 'luxon'
import type { Person } from '#shared/schemas/person'
import type { MoveTaskInput, Task } from '#shared/schemas/task'
import { conflict, forbidden, validationError } from '../../lib/errors'
import { getFacility } from '../facility/facility.service'
import { findPerson } from '../people/person-reads'
import { isOnShift } from '../roster/shift-reads'
import { routineTasksBetween, writeTaskMove, type TaskMove } from '../tasks/task-move-writes'
import type { TaskRow } from '../tasks/task-writes.service'
import { getTask, getTaskRow } from '../tasks/tasks.service'

const FINISHED = ['done', 'skipped']

/**
 * A supervisor's drag on the board: assign, unassign, or move to another day. Every move is
 * checked here (role, the person on shift that day, the routine's neighbouring occurrences,
 * the version the board saw); a stale version answers 409 so the board refreshes that card.
 */
export async function moveTask(taskId: number, actor: Person, data: MoveTaskInput): Promise<Task> {
  if (actor.role !== 'manager' && actor.role !== 'supervisor') throw forbidden('Only supervisors and managers can assign or move tasks.')
  const task = await getTaskRow(taskId)
  if (task.version !== data.version) throw conflict('Someone changed this task a moment ago; the board has been refreshed.', { currentVersion: task.version })
  if (FINISHED.includes(task.status)) throw conflict('This task is already finished and stays where it was done.')

  const changes: TaskMove = {}
  if (data.date !== undefined && data.date !== task.localDate) Object.assign(changes, await newDay(task, data.date))
  const day = changes.localDate ?? task.localDate
  if (data.assigneeId !== undefined) {
    if (data.assigneeId !== null) await assertOnShift(data.assigneeId, day)
    changes.assigneeId = data.assigneeId
    changes.assignedManually = data.assigneeId !== null
  } else if (changes.localDate && task.assigneeId && task.assignedManually) {
    await assertOnShift(task.assigneeId, day)
  }
  await writeTaskMove(task, changes)
  return getTask(task.id)
}

async function assertOnShift(personId: number, date: string) {
  const person = await findPerson(personId)
  if (!person || !person.active) throw validationError('Choose an active person.', { assigneeId: ['Not an active person'] })
  if (!(await isOnShift(personId, date))) throw conflict(`${person.name} is not on shift on ${date}. Add a shift on the roster first.`)
}

/** A routine task may move only between its neighbouring occurrences, and never into the past. */
async function newDay(task: TaskRow, date: string): Promise<TaskMove> {
  const zone = (await getFacility()).timeZone
  const today = DateTime.now().setZone(zone).toISODate()!
  if (date < today) throw conflict('A task cannot be moved into the past.')
  if (task.routineId !== null) {
    const siblings = await routineTasksBetween(task, minDate(date, task.localDate), maxDate(date, task.localDate))
    const inTheWay = siblings.find(
      (s) =>
        s.id !== task.id && (date > task.localDate ? s.localDate > task.localDate && s.localDate <= date : s.localDate < task.localDate && s.localDate >= date),
    )
    if (inTheWay) {
      throw conflict(`This routine already has this task on ${inTheWay.localDate}; it can only move between its own occurrences.`)
    }
  }
  const local = DateTime.fromISO(`${date}T${task.localStart.slice(11)}`, { zone })
  const shift = local.toMillis() - task.dueAt.getTime()
  return {
    localDate: date,
    localStart: local.toFormat("yyyy-MM-dd'T'HH:mm:ss"),
    dueAt: local.toJSDate(),
    windowStartAt: new Date(task.windowStartAt.getTime() + shift),
    graceUntil: new Date(task.graceUntil.getTime() + shift),
    status: 'planned',
    edited: true,
  }
}

const minDate = (a: string, b: string) => (a < b ? a : b)
const maxDate = (a: string, b: string) => (a > b ? a : b)
