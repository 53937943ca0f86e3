import { PushSubscriptionInputSchema } from '#shared/schemas/preferences'
import type { PushOutboxMessage } from '#shared/schemas/ladder'
import { db } from '../../db/data-source'
import type { AppConfig } from '../../lib/config'
import { AppError, notFound } from '../../lib/errors'
import { findContact } from '../people/contact.service'
import { PushOutboxEntity } from './escalation.entities'
import { pushSubscriptionByEndpoint, registerPushSubscription } from './push-subscriptions.service'

const localOnly = (config: AppConfig): string => {
  if (config.push.mode !== 'local' || !config.push.localUrl || !config.push.vapid) throw notFound('The push outbox (only in local push mode)')
  return config.push.localUrl
}

/** What the local push service decrypted or refused, newest first, with whose device it was. */
export async function localPushes(config: AppConfig): Promise<PushOutboxMessage[]> {
  localOnly(config)
  const rows = await db()
    .getRepository(PushOutboxEntity)
    .find({ order: { id: 'DESC' }, take: 200 })
  const names = new Map<string, string | null>()
  for (const endpoint of new Set(rows.map((r) => r.endpoint))) {
    const device = await pushSubscriptionByEndpoint(endpoint)
    names.set(endpoint, device ? ((await findContact(device.personId))?.name ?? null) : null)
  }
  return rows.map((r) => ({ ...r, personName: names.get(r.endpoint) ?? null, receivedAt: r.receivedAt.toISOString() }))
}

/**
 * Local mode: a stand-in device for this person, made at the local push service (a browser
 * subscribes at its own vendor's push service, which a machine without internet cannot reach),
 * then registered like the settings page registers a phone. Their push alerts then show here.
 */
export async function addStandInDevice(config: AppConfig, personId: number): Promise<void> {
  const url = localOnly(config)
  const res = await fetch(`${url}/local/devices`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ applicationServerKey: config.push.vapid!.publicKey }),
    signal: AbortSignal.timeout(10_000),
  }).catch(() => null)
  if (!res?.ok) throw new AppError(503, 'service_unavailable', `The local push service did not make a device (${res ? res.status : 'no answer'}).`)
  await registerPushSubscription(personId, PushSubscriptionInputSchema.parse(await res.json()))
}
