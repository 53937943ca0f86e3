import { LessThan } from 'typeorm'
import { db } from '../../db/data-source'
import { logger } from '../../lib/logger'
import { queueFallback } from './channels'
import { NotificationEntity } from './escalation.entities'

/**
 * How long a claimed message may stay `sending` before its sender counts as stopped. Every
 * sender gives up far sooner (mail socket 10 s, push 10 s, the text SDK's 30 s request timeout),
 * so a claim this old belongs to a process that died or hung between claiming and hearing back;
 * five minutes is still short enough that the next channel goes out while the alarm matters.
 */
export const STUCK_SENDING_AFTER_MS = 5 * 60_000

export const STUCK_NOTE =
  'Unknown: the app stopped while sending, so whether it arrived is not known. Not sent again (a second copy could reach the person); the next channel was tried.'

/**
 * Resolves messages whose sender stopped after claiming them: each becomes `unknown` (never
 * resent on the same channel) and the person's next channel is queued, as for a failed one.
 * The delivery pass right after sends that fallback, or marks it superseded when the alert was
 * answered meanwhile, the same check every queued message gets. The `sending → unknown` move is
 * conditional, so two processes resolve a row once.
 */
export async function resolveStuckSends(now: Date): Promise<number> {
  const repo = db().getRepository(NotificationEntity)
  const stuck = await repo.find({
    where: { status: 'sending', claimedAt: LessThan(new Date(now.getTime() - STUCK_SENDING_AFTER_MS)) },
    order: { id: 'ASC' },
    take: 200,
  })
  let resolved = 0
  for (const row of stuck) {
    const moved = await repo.update({ id: row.id, status: 'sending' }, { status: 'unknown', lastError: STUCK_NOTE })
    if (!moved.affected) continue
    resolved++
    const next = await queueFallback(row, now)
    logger.warn(
      { notification: row.id, channel: row.channel, claimedAt: row.claimedAt, fallback: next },
      'message left sending by a stopped sender; marked unknown',
    )
  }
  return resolved
}
