import webpush from 'web-push'
import type { AppConfig } from '../lib/config'

export interface PushTarget {
  endpoint: string
  keys: { p256dh: string; auth: string }
}

/** What the push service said: accepted, or gone for good (the subscription is to be forgotten). */
export type PushResult = { status: 'accepted'; messageId: string | null } | { status: 'gone'; code: number }

export class PushRefusedError extends Error {
  readonly status: number
  constructor(status: number, body: string) {
    super(`The push service refused the message (${status}): ${body.slice(0, 200)}`)
    this.status = status
  }
}

export interface PushSender {
  publicKey: string
  send(target: PushTarget, payload: object): Promise<PushResult>
}

/**
 * Encrypts (RFC 8291, aes128gcm) and signs (VAPID, RFC 8292) with `web-push`, then posts the
 * request (RFC 8030) with fetch: web-push's own sender speaks only HTTPS, and the local push
 * service on loopback speaks HTTP. Urgency is high: these are alarms.
 */
export function createPushSender(config: AppConfig): PushSender | null {
  if (!config.push.enabled || !config.push.vapid) return null
  const vapidDetails = { subject: config.push.subject, ...config.push.vapid }
  return {
    publicKey: config.push.vapid.publicKey,
    async send(target, payload) {
      const request = webpush.generateRequestDetails(target, JSON.stringify(payload), { vapidDetails, TTL: 3600, urgency: 'high' })
      const res = await fetch(request.endpoint, {
        method: request.method,
        headers: request.headers as Record<string, string>,
        body: new Uint8Array(request.body),
        signal: AbortSignal.timeout(10_000),
      })
      if (res.status === 404 || res.status === 410) return { status: 'gone', code: res.status }
      if (!res.ok) throw new PushRefusedError(res.status, await res.text())
      return { status: 'accepted', messageId: res.headers.get('location') }
    },
  }
}
