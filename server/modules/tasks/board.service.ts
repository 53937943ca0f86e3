import type { Board } from '#shared/schemas/board'
import { db } from '../../db/data-source'
import { PersonEntity } from '../people/person.entity'
import { ShiftEntity } from '../roster/roster.entities'
import { TaskEntity } from './task.entity'
import { toTask } from './task.mapper'
import { loadTaskContext } from './tasks.service'

/** One day's tasks and a column per person on shift (or holding tasks) that day. */
export async function getBoard(date: string): Promise<Board> {
  const [rows, shifts, ctx] = await Promise.all([
    db().getRepository(TaskEntity).find({ where: { localDate: date }, order: { dueAt: 'ASC', id: 'ASC' } }),
    db().getRepository(ShiftEntity).find({ where: { date }, order: { start: 'ASC' } }),
    loadTaskContext(),
  ])
  const personIds = [...new Set([...shifts.map((s) => s.personId), ...rows.flatMap((r) => (r.assigneeId ? [r.assigneeId] : []))])]
  const people = personIds.length ? await db().getRepository(PersonEntity).findBy(personIds.map((id) => ({ id }))) : []
  const tasks = rows.map((r) => toTask(r, ctx))
  return {
    date,
    tasks,
    people: people
      .map((p) => {
        const own = tasks.filter((t) => t.assigneeId === p.id)
        return {
          personId: p.id,
          name: p.name,
          role: p.role,
          shifts: shifts.filter((s) => s.personId === p.id).map(({ start, end, kind }) => ({ start, end, kind })),
          taskCount: own.length,
          plannedMinutes: own.reduce((sum, t) => sum + t.durationMinutes, 0),
        }
      })
      .sort((a, b) => (a.shifts[0]?.start ?? '99').localeCompare(b.shifts[0]?.start ?? '99') || a.name.localeCompare(b.name)),
  }
}
