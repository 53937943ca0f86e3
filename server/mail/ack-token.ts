import { createHmac, timingSafeEqual } from 'node:crypto'

/**
 * An acknowledge link's token: notification id and expiry, signed with HMAC-SHA256 under the
 * acknowledge key (never the cookie key). Single use is enforced by the notification row (`ackUsedAt`), not the token.
 */
export function signAckToken(secret: string, notificationId: number, expiresAt: Date): string {
  if (!secret) throw new Error('The acknowledge key is not set.')
  const payload = `${notificationId}.${Math.floor(expiresAt.getTime() / 1000)}`
  return `${payload}.${mac(secret, payload)}`
}

export type AckTokenCheck = { ok: true; notificationId: number } | { ok: false; reason: 'forged' | 'expired' }

export function verifyAckToken(secret: string, token: string, now = new Date()): AckTokenCheck {
  const match = /^(\d{1,12})\.(\d{1,12})\.([A-Za-z0-9_-]{43})$/.exec(token)
  if (!match) return { ok: false, reason: 'forged' }
  const [, id, exp, signature] = match
  const expected = Buffer.from(mac(secret, `${id}.${exp}`))
  if (!timingSafeEqual(expected, Buffer.from(signature))) return { ok: false, reason: 'forged' }
  if (Number(exp) * 1000 < now.getTime()) return { ok: false, reason: 'expired' }
  return { ok: true, notificationId: Number(id) }
}

const mac = (secret: string, payload: string) => createHmac('sha256', `ack:${secret}`).update(payload).digest('base64url')
