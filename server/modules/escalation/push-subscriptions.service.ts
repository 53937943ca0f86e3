import { createHash } from 'node:crypto'
import type { PushSubscriptionInput } from '#shared/schemas/preferences'
import { db } from '../../db/data-source'
import { PushSubscriptionEntity, type PushSubscriptionRow } from './push-subscription.entity'

const hashOf = (endpoint: string) => createHash('sha256').update(endpoint).digest('hex')

/**
 * Registers this device for a person. An endpoint belongs to one browser profile, so when it
 * comes again (another person signs in on that phone) it moves to the newest person.
 */
export async function registerPushSubscription(personId: number, input: PushSubscriptionInput) {
  const endpointHash = hashOf(input.endpoint)
  const row = { personId, endpointHash, endpoint: input.endpoint, p256dh: input.keys.p256dh, auth: input.keys.auth, createdAt: new Date() }
  await db().getRepository(PushSubscriptionEntity).upsert(row, ['endpointHash'])
}

/** Forgets this device for the person (only their own). */
export async function removePushSubscription(personId: number, endpoint: string) {
  await db()
    .getRepository(PushSubscriptionEntity)
    .delete({ personId, endpointHash: hashOf(endpoint) })
}

export const pushSubscriptionByEndpoint = (endpoint: string): Promise<PushSubscriptionRow | null> =>
  db()
    .getRepository(PushSubscriptionEntity)
    .findOneBy({ endpointHash: hashOf(endpoint) })

export const pushSubscriptionsOf = (personId: number): Promise<PushSubscriptionRow[]> => db().getRepository(PushSubscriptionEntity).findBy({ personId })

/** The push service said the subscription is gone (404/410): never send to it again. */
export async function forgetPushSubscription(id: number) {
  await db().getRepository(PushSubscriptionEntity).delete({ id })
}
