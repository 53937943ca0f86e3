import type { Channel } from '#shared/schemas/ladder'
import { db } from '../../db/data-source'
import { findContact, type Contact } from '../people/contact.service'
import { NotificationEntity, type NotificationRow } from './escalation.entities'

/** When a channel fails, the next one tried; e-mail comes last because every person has an address. */
export const FALLBACK_ORDER: Channel[] = ['sms', 'push', 'email']

export const acceptedChannels = (p: Pick<Contact, 'channels'>): Channel[] => (p.channels?.length ? p.channels : ['email'])

/** Where a channel reaches this person, or null when it cannot (no mobile number). */
export const destinationFor = (p: Pick<Contact, 'email' | 'phone'>, channel: Channel): string | null =>
  channel === 'sms' ? p.phone || null : channel === 'email' ? p.email : 'push'

/**
 * The channels a ladder step uses for one person: the step's channels that the person accepts,
 * or every channel they accept when they hold the on-call duty at that moment. Nobody the ladder
 * names is dropped for want of a channel: e-mail then carries it.
 */
export function channelsFor(person: Pick<Contact, 'channels' | 'phone' | 'email'>, stepChannels: Channel[], onCall: boolean): Channel[] {
  const accepted = acceptedChannels(person)
  const chosen = (onCall ? accepted : stepChannels.filter((c) => accepted.includes(c))).filter((c) => destinationFor(person, c) !== null)
  return chosen.length ? chosen : ['email']
}

/**
 * Queues the next channel after one that failed, unless this person already has it for this
 * step. The unique (alert, step, person, channel) key makes a repeated call a no-op.
 */
export async function queueFallback(failed: NotificationRow, now: Date): Promise<Channel | null> {
  const person = await findContact(failed.personId)
  if (!person) return null
  const existing = new Set(
    (await db().getRepository(NotificationEntity).findBy({ alertId: failed.alertId, step: failed.step, personId: failed.personId })).map((n) => n.channel),
  )
  const accepted = acceptedChannels(person)
  const next = FALLBACK_ORDER.slice(FALLBACK_ORDER.indexOf(failed.channel) + 1).find(
    (c) => !existing.has(c) && (c === 'email' || accepted.includes(c)) && destinationFor(person, c) !== null,
  )
  if (!next) return null
  await db()
    .getRepository(NotificationEntity)
    .createQueryBuilder()
    .insert()
    .values({
      alertId: failed.alertId,
      step: failed.step,
      personId: failed.personId,
      channel: next,
      email: person.email,
      destination: destinationFor(person, next),
      subject: '',
      status: 'pending',
      urgent: failed.urgent,
      attempts: 0,
      nextAttemptAt: now,
    })
    .orIgnore()
    .execute()
  return next
}
