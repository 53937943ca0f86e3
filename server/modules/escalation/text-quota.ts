import { db } from '../../db/data-source'
import { logger } from '../../lib/logger'
import type { TextSender } from '../../sms/text-client'
import { findContact } from '../people/contact.service'
import { TextQuotaEntity } from './escalation.entities'

const HOUR_MS = 3_600_000
export const hourStartOf = (at: Date) => new Date(Math.floor(at.getTime() / HOUR_MS) * HOUR_MS)

/**
 * Takes one of a person's texts for the clock hour of `at`, or counts one held back. The slot is
 * a conditional `used < limit` update on one row, so the limit holds however many processes send.
 */
export async function takeTextSlot(personId: number, at: Date, limit: number): Promise<boolean> {
  const repo = db().getRepository(TextQuotaEntity)
  const hourStart = hourStartOf(at)
  await repo.createQueryBuilder().insert().values({ personId, hourStart }).orIgnore().execute()
  const taken = await repo
    .createQueryBuilder()
    .update()
    .set({ used: () => 'used + 1' })
    .where('personId = :personId AND hourStart = :hourStart AND used < :limit', { personId, hourStart, limit })
    .execute()
  if (taken.affected) return true
  await repo
    .createQueryBuilder()
    .update()
    .set({ suppressed: () => 'suppressed + 1' })
    .where('personId = :personId AND hourStart = :hourStart', { personId, hourStart })
    .execute()
  return false
}

/**
 * A storm collapses into one summary text per person and hour: sent once, in the delivery pass
 * that first held texts back (claimed `none → sending` first, like every message). Texts held
 * back later in the same hour are on the alert records, not in further texts.
 */
export async function sendStormSummaries(sender: TextSender, limit: number, publicUrl: string): Promise<number> {
  const repo = db().getRepository(TextQuotaEntity)
  const due = await repo.createQueryBuilder('q').where('q.summaryStatus = :none AND q.suppressed > 0', { none: 'none' }).getMany()
  let sent = 0
  for (const quota of due) {
    const claimed = await repo.update({ personId: quota.personId, hourStart: quota.hourStart, summaryStatus: 'none' }, { summaryStatus: 'sending' })
    if (!claimed.affected) continue
    const person = await findContact(quota.personId)
    if (!person?.phone) {
      await repo.update({ personId: quota.personId, hourStart: quota.hourStart }, { summaryStatus: 'failed' })
      continue
    }
    const body = `Roundtide: more alerts than ${limit} texts an hour. ${quota.suppressed} more were not texted; each is on its alert record. Open ${publicUrl}/on-call`
    try {
      const message = await sender.send(person.phone, body)
      await repo.update({ personId: quota.personId, hourStart: quota.hourStart }, { summaryStatus: 'sent', summaryProviderId: message.sid })
      sent++
    } catch (err) {
      logger.warn({ err, person: quota.personId }, 'storm summary text not sent')
      await repo.update({ personId: quota.personId, hourStart: quota.hourStart }, { summaryStatus: 'failed' })
    }
  }
  return sent
}
