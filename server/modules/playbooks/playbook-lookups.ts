import { In, Not } from 'typeorm'
import { db } from '../../db/data-source'
import { BatchRecordEntity, EventEntity, type BatchRecordRow, type EventRow } from './playbook.entities'

// What other modules read of events and batch records (the tank page, the calendar); they never touch the entities (record 13b).

/** The latest records of these batches, newest first. */
export const latestBatchRecords = async (batchIds: readonly number[], take: number): Promise<BatchRecordRow[]> =>
  batchIds.length
    ? db()
        .getRepository(BatchRecordEntity)
        .find({ where: { batchId: In([...batchIds]) }, order: { createdAt: 'DESC' }, take })
    : []

/** The events among the latest `scanned` (by start, newest first) that involve this tank. */
export const latestEventsOfTank = async (tankId: number, scanned: number): Promise<EventRow[]> =>
  (
    await db()
      .getRepository(EventEntity)
      .find({ order: { startsAt: 'DESC' }, take: scanned })
  ).filter((e) => e.tankIds.includes(tankId))

/** Events that still stand (planned or ended, not cancelled), for the calendar. */
export const eventsNotCancelled = () =>
  db()
    .getRepository(EventEntity)
    .find({ where: { status: Not('cancelled') } })
