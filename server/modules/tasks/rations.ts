import { In } from 'typeorm'
import { planDailyRation } from '#shared/feeding/ration'
import { db } from '../../db/data-source'
import { TaskEntity } from './task.entity'
import type { Catalogue } from './targets'

/**
 * Grams for each feeding task of a day: the tank's share of its batch (count ÷ tanks, times
 * the batch's mean weight) × the batch's feeding rate, split across that tank's feeds that
 * day that are not held. A new sample weighing changes the mean weight, and so these.
 */
export async function rationsForDay(date: string, tankIds: number[], cat: Catalogue): Promise<Map<number, number>> {
  const out = new Map<number, number>()
  if (!tankIds.length) return out
  const feeds = await db()
    .getRepository(TaskEntity)
    .find({
      where: { localDate: date, category: 'feeding', tankId: In(tankIds), status: In(['planned', 'open', 'overdue', 'done', 'missed']) },
      order: { dueAt: 'ASC' },
    })
  const batches = [...cat.batches.values()].filter((b) => b.status === 'active' || b.status === 'quarantine')
  for (const tankId of new Set(feeds.map((f) => f.tankId!))) {
    const batch = batches.find((b) => b.tankIds.includes(tankId))
    if (!batch?.feedRatePct || !batch.meanWeightG || !batch.count) continue
    const own = feeds.filter((f) => f.tankId === tankId)
    const count = Math.max(1, Math.round(batch.count / Math.max(1, batch.tankIds.length)))
    const plan = planDailyRation({ count, meanWeightG: batch.meanWeightG, ratePercentPerDay: batch.feedRatePct, feeds: own.length })
    own.forEach((f, i) => out.set(f.id, plan.perFeedG[i]))
  }
  return out
}
