import { db } from '../../db/data-source'
import { holdFeeds, releaseFeeds } from '../tasks/task-writes.service'
import { EventEntity, type EventRow } from './playbook.entities'

const fastingReason = (event: EventRow) => `Fasting before ${event.title}`.slice(0, 300)

/**
 * Holds the feeding tasks of an event's tanks inside its fasting window: status `held` with
 * the reason, never counted as missed or escalated. Idempotent, so it can run after every
 * materialisation too.
 */
export async function holdFeedsForEvent(event: EventRow): Promise<number> {
  if (!event.fastingFrom || !event.fastingTo || event.status !== 'planned' || !event.tankIds.length) return 0
  return holdFeeds({ tankIds: event.tankIds, reason: fastingReason(event) }, event.fastingFrom, event.fastingTo)
}

/** Ending or cancelling an event gives back the held feeds that are still ahead; past ones stay held. */
export async function releaseFeedsForEvent(event: EventRow, now = new Date()): Promise<number> {
  if (!event.fastingFrom || !event.tankIds.length) return 0
  return releaseFeeds({ tankIds: event.tankIds, reason: fastingReason(event) }, now)
}

/** Re-applies every planned event's fasting window (new feeding tasks may have been materialised). */
export async function holdFeedsForAllEvents(): Promise<number> {
  const events = await db()
    .getRepository(EventEntity)
    .find({ where: { status: 'planned' } })
  let held = 0
  for (const e of events) if (e.fastingTo && e.fastingTo > new Date()) held += await holdFeedsForEvent(e)
  return held
}
