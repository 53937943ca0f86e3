import { In } from 'typeorm'
import { db } from '../../db/data-source'
import { BatchRecordEntity, EventEntity, type BatchRecordRow, type EventRow } from './playbook.entities'

// What the tank page reads of events and batch records; the report module never touches the entities (record 13b).

/** The latest records of these batches, newest first. */
export const latestBatchRecords = async (batchIds: readonly number[], take: number): Promise<BatchRecordRow[]> =>
  batchIds.length ? db().getRepository(BatchRecordEntity).find({ where: { batchId: In([...batchIds]) }, order: { createdAt: 'DESC' }, take }) : []

/** The events among the latest `scanned` (by start, newest first) that involve this tank. */
export const latestEventsOfTank = async (tankId: number, scanned: number): Promise<EventRow[]> =>
  (await db().getRepository(EventEntity).find({ order: { startsAt: 'DESC' }, take: scanned })).filter((e) => e.tankIds.includes(tankId))
