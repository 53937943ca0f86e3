import { In, type EntityManager } from 'typeorm'
import { db } from '../../db/data-source'
import { TaskEntity } from '../tasks/task.entity'
import { EventEntity, type EventRow } from './playbook.entities'

/**
 * Holds the feeding tasks of an event's tanks inside its fasting window: status `held` with
 * the reason, never counted as missed or escalated. Idempotent, so it can run after every
 * materialisation too.
 */
export async function holdFeedsForEvent(event: EventRow, manager: EntityManager = db()): Promise<number> {
  if (!event.fastingFrom || !event.fastingTo || event.status !== 'planned' || !event.tankIds.length) return 0
  const result = await manager
    .createQueryBuilder()
    .update(TaskEntity)
    .set({ status: 'held', heldReason: `Fasting before ${event.title}`.slice(0, 300), version: () => 'version + 1' })
    .where({ category: 'feeding', tankId: In(event.tankIds), status: In(['planned', 'open', 'overdue']) })
    .andWhere('dueAt >= :from AND dueAt < :to', { from: event.fastingFrom, to: event.fastingTo })
    .andWhere('eventId IS NULL')
    .execute()
  return result.affected ?? 0
}

/** Ending or cancelling an event gives back the held feeds that are still ahead; past ones stay held. */
export async function releaseFeedsForEvent(event: EventRow, now = new Date(), manager: EntityManager = db()): Promise<number> {
  if (!event.fastingFrom || !event.tankIds.length) return 0
  const result = await manager
    .createQueryBuilder()
    .update(TaskEntity)
    .set({ status: 'planned', heldReason: null, version: () => 'version + 1' })
    .where({ status: 'held', category: 'feeding', tankId: In(event.tankIds) })
    .andWhere('dueAt > :now', { now })
    .andWhere('heldReason = :reason', { reason: `Fasting before ${event.title}`.slice(0, 300) })
    .execute()
  return result.affected ?? 0
}

/** Re-applies every planned event's fasting window (new feeding tasks may have been materialised). */
export async function holdFeedsForAllEvents(): Promise<number> {
  const events = await db().getRepository(EventEntity).find({ where: { status: 'planned' } })
  let held = 0
  for (const e of events) if (e.fastingTo && e.fastingTo > new Date()) held += await holdFeedsForEvent(e)
  return held
}
