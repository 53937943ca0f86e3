import { In } from 'typeorm'
import { db } from '../../db/data-source'
import { TaskEntity, type TaskRow } from './task.entity'

// Task rows as the escalation and report modules read them; they never touch the entity (record 13b).
export type { TaskRow }

const tasks = () => db().getRepository(TaskEntity)

export const findTaskRow = (id: number): Promise<TaskRow | null> => tasks().findOneBy({ id })

export const taskRowsByIds = async (ids: readonly number[]): Promise<TaskRow[]> => (ids.length ? tasks().findBy({ id: In([...ids]) }) : [])

/** The tasks of facility days from–to (both included). */
export const taskRowsBetween = (from: string, to: string): Promise<TaskRow[]> =>
  tasks().createQueryBuilder('t').where('t.localDate BETWEEN :from AND :to', { from, to }).getMany()

/** The tasks of facility days from–to that were flagged or missed (what a response report is about). */
export const flaggedOrMissedBetween = (from: string, to: string): Promise<TaskRow[]> =>
  tasks()
    .createQueryBuilder('t')
    .where('t.localDate BETWEEN :from AND :to', { from, to })
    .andWhere('(t.flag IS NOT NULL OR t.status = :missed)', { missed: 'missed' })
    .getMany()

/** Welfare and quarantine checks of facility days from–to, of these tanks (all when none named), by due time. */
export function welfareChecksBetween(from: string, to: string, tankIds: number[]): Promise<TaskRow[]> {
  const qb = tasks().createQueryBuilder('t').where('t.localDate BETWEEN :from AND :to', { from, to }).andWhere('t.category IN (:...cats)', { cats: ['welfare', 'quarantine'] })
  if (tankIds.length) qb.andWhere('t.tankId IN (:...tankIds)', { tankIds })
  return qb.orderBy('t.dueAt', 'ASC').getMany()
}

/** The rechecks raised after any of these tasks. */
export const rechecksOfTasks = async (taskIds: readonly number[]): Promise<TaskRow[]> => (taskIds.length ? tasks().findBy({ recheckOfTaskId: In([...taskIds]) }) : [])

/** A tank's latest tasks, newest due first. */
export const latestTasksOfTank = (tankId: number, take: number): Promise<TaskRow[]> => tasks().find({ where: { tankId }, order: { dueAt: 'DESC' }, take })
