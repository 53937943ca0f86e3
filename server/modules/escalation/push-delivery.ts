import { logger } from '../../lib/logger'
import type { PushSender } from '../../push/push-client'
import type { NotificationRow } from './escalation.entities'
import { forgetPushSubscription, pushSubscriptionsOf } from './push-subscriptions.service'

/** What the service worker needs: what to show, and paths (on its own origin) to open and to acknowledge. */
export interface PushAlertPayload {
  title: string
  body: string
  tag: string
  url: string
  ackUrl: string
}

type PushOutcome = { status: 'sent'; providerId: string | null } | { status: 'undelivered'; note: string }

/**
 * Sends one alert to every device the person registered. Sent when any push service accepted
 * it; a device whose subscription is gone (404/410) is forgotten; when none is left the row is
 * undelivered (and falls back). Errors from every device are thrown, so the row retries.
 */
export async function sendPushAlert(sender: PushSender, row: NotificationRow, payload: PushAlertPayload): Promise<PushOutcome> {
  const devices = await pushSubscriptionsOf(row.personId)
  if (!devices.length) return { status: 'undelivered', note: 'No device of this person has push alerts turned on' }
  let accepted: { messageId: string | null } | null = null
  let firstError: unknown = null
  for (const device of devices) {
    try {
      const result = await sender.send({ endpoint: device.endpoint, keys: { p256dh: device.p256dh, auth: device.auth } }, payload)
      if (result.status === 'gone') await forgetPushSubscription(device.id)
      else accepted ??= result
    } catch (err) {
      firstError ??= err
      logger.warn({ err, notification: row.id, device: device.id }, 'push not accepted by one device')
    }
  }
  if (accepted) return { status: 'sent', providerId: accepted.messageId?.slice(0, 64) ?? null }
  if (firstError) throw firstError
  return { status: 'undelivered', note: 'Every device of this person stopped accepting push alerts (subscription gone)' }
}
