import { In, IsNull } from 'typeorm'
import { db } from '../../db/data-source'
import { ReadingEntity, type ReadingRow } from './completion.entities'

// Readings as the report module reads them; it never touches the entity (record 13b).
export type { ReadingRow }

const readings = () => db().getRepository(ReadingEntity)

/** Every reading recorded on these tasks, corrected ones included (`supersededAt` tells them apart). */
export const readingsOfTasks = async (taskIds: readonly number[]): Promise<ReadingRow[]> =>
  taskIds.length ? readings().find({ where: { taskId: In([...taskIds]) } }) : []

/** The current (not superseded) readings taken at a tank or a system between two instants, oldest first. */
export const currentReadingsAt = (place: 'tankId' | 'systemId', id: number, from: Date, to: Date): Promise<ReadingRow[]> =>
  readings()
    .createQueryBuilder('r')
    .where(`r.${place} = :id`, { id })
    .andWhere('r.takenAt BETWEEN :from AND :to', { from, to })
    .andWhere({ supersededAt: IsNull() })
    .orderBy('r.takenAt', 'ASC')
    .getMany()
