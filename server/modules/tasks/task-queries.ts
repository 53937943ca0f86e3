import { Between, In, MoreThan } from 'typeorm'
import { db } from '../../db/data-source'
import { TaskEntity, type TaskRow } from './task.entity'

/**
 * Reads of task rows that other modules (roster, escalation, reports, the status clock) need, so
 * they never query the entity themselves (record 13b).
 */
export type { TaskRow }

const tasks = () => db().getRepository(TaskEntity)

/** Tasks a routine's assignee rule may (re)assign between two facility dates: not assigned by hand, not finished or held. */
export const tasksForAssigneeRules = (from: string, to: string, routineIds?: number[]) =>
  tasks().find({
    select: { id: true, routineId: true, localDate: true, localStart: true, dueAt: true, areaId: true, targetKind: true, targetId: true, assigneeId: true },
    where: {
      localDate: Between(from, to),
      assignedManually: false,
      status: In(['planned', 'open', 'overdue']),
      ...(routineIds ? { routineId: In(routineIds) } : {}),
    },
  })

/** How many tasks each facility day has, by status and category. */
export const taskCountsByDay = (from: string, to: string) =>
  tasks()
    .createQueryBuilder('t')
    .select(['t.localDate AS date', 't.status AS status', 't.category AS category', 'COUNT(*) AS n'])
    .where('t.localDate BETWEEN :from AND :to', { from, to })
    .groupBy('t.localDate')
    .addGroupBy('t.status')
    .addGroupBy('t.category')
    .getRawMany<{ date: string; status: string; category: string; n: string }>()

/** Tasks between two facility dates that are still to do (not finished, not held). */
export const tasksStillToDo = (from: string, to: string): Promise<TaskRow[]> =>
  tasks().createQueryBuilder('t').where('t.localDate BETWEEN :from AND :to', { from, to }).andWhere("t.status NOT IN ('done', 'skipped', 'held')").getMany()

/** Every task between two facility dates, earliest due first. */
export const tasksBetween = (from: string, to: string): Promise<TaskRow[]> =>
  tasks().createQueryBuilder('t').where('t.localDate BETWEEN :from AND :to', { from, to }).orderBy('t.dueAt', 'ASC').getMany()

/** Tasks finished with a watch or critical flag since an instant, latest first. */
export const flaggedSince = (since: Date): Promise<TaskRow[]> =>
  tasks().find({ where: { flag: In(['watch', 'critical']), completedAt: MoreThan(since) }, order: { completedAt: 'DESC' } })

/** The rechecks raised after these tasks. */
export const rechecksOf = (taskIds: readonly number[]): Promise<TaskRow[]> =>
  taskIds.length ? tasks().find({ where: { recheckOfTaskId: In([...taskIds]) } }) : Promise.resolve([])

/** These tasks' rows; ids that no longer exist are left out. */
export const taskRowsByIds = (ids: readonly number[]): Promise<TaskRow[]> => (ids.length ? tasks().findBy({ id: In([...ids]) }) : Promise.resolve([]))

/** The welfare-critical tasks among these. */
export const welfareCriticalAmong = (ids: number[]): Promise<TaskRow[]> =>
  ids.length ? tasks().findBy({ id: In(ids), priority: 'welfare_critical' }) : Promise.resolve([])

export const findTaskRow = (id: number): Promise<TaskRow | null> => tasks().findOneBy({ id })

/** The tasks of facility days from–to that were flagged or missed (what a response report is about). */
export const flaggedOrMissedBetween = (from: string, to: string): Promise<TaskRow[]> =>
  tasks()
    .createQueryBuilder('t')
    .where('t.localDate BETWEEN :from AND :to', { from, to })
    .andWhere('(t.flag IS NOT NULL OR t.status = :missed)', { missed: 'missed' })
    .getMany()

/** Welfare and quarantine checks of facility days from–to, of these tanks (all when none named), by due time. */
export function welfareChecksBetween(from: string, to: string, tankIds: number[]): Promise<TaskRow[]> {
  const qb = tasks()
    .createQueryBuilder('t')
    .where('t.localDate BETWEEN :from AND :to', { from, to })
    .andWhere('t.category IN (:...cats)', { cats: ['welfare', 'quarantine'] })
  if (tankIds.length) qb.andWhere('t.tankId IN (:...tankIds)', { tankIds })
  return qb.orderBy('t.dueAt', 'ASC').getMany()
}

/** A tank's latest tasks, newest due first. */
export const latestTasksOfTank = (tankId: number, take: number): Promise<TaskRow[]> => tasks().find({ where: { tankId }, order: { dueAt: 'DESC' }, take })
