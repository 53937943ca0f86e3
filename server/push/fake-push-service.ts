import { createDecipheriv, createECDH, createPublicKey, hkdfSync, randomBytes, verify } from 'node:crypto'
import type { AddressInfo } from 'node:net'
import express from 'express'
import { db } from '../db/data-source'
import { logger } from '../lib/logger'
import { PushOutboxEntity, type PushOutboxRow } from '../modules/escalation/escalation.entities'

/** A device's private half, as the browser keeps it: the ECDH P-256 key and the 16-byte auth secret. */
export interface DeviceKeys {
  privateKey: Buffer
  publicKey: Buffer
  auth: Buffer
}

export interface ReceivedPush {
  endpoint: string
  urgency: string | null
  ttl: number
  payload: unknown
  receivedAt: Date
}

/** RFC 8030 §7.2: a push service must accept at least 4096 bytes. */
const MAX_BODY = 4096 + 100
const b64u = (b: Buffer) => b.toString('base64url')
const fromB64u = (s: string) => Buffer.from(s, 'base64url')

/** RFC 8292 §3: `vapid t=<JWT>, k=<public key>`; the JWT is ES256 over the push service's origin. Null when it is fine. */
export function vapidProblem(header: string | undefined, audience: string, expectedKey?: string, now = Date.now()): string | null {
  const match = /^vapid t=([\w-]+\.[\w-]+\.[\w-]+),\s*k=([\w-]+)$/.exec(header ?? '')
  if (!match) return 'Missing or malformed VAPID Authorization header'
  const [, jwt, k] = match
  // RFC 8292 §4.2: the key must be the one the subscription was made with.
  if (expectedKey !== undefined && k !== expectedKey.replace(/=+$/, '')) return 'Not the key this subscription was made with'
  const raw = fromB64u(k)
  if (raw.length !== 65 || raw[0] !== 4) return 'The k parameter is not an uncompressed P-256 public key'
  const [head, body, signature] = jwt.split('.')
  const key = createPublicKey({ key: { kty: 'EC', crv: 'P-256', x: b64u(raw.subarray(1, 33)), y: b64u(raw.subarray(33)) }, format: 'jwk' })
  let header_: { alg?: string }
  let claims: { aud?: string; exp?: number; sub?: string }
  try {
    header_ = JSON.parse(fromB64u(head).toString('utf8'))
    claims = JSON.parse(fromB64u(body).toString('utf8'))
  } catch {
    return 'The JWT is not JSON'
  }
  if (header_.alg !== 'ES256') return 'The JWT is not signed with ES256'
  // ES256 signatures in a JWT are r||s (64 bytes), not DER.
  if (!verify('sha256', Buffer.from(`${head}.${body}`), { key, dsaEncoding: 'ieee-p1363' }, fromB64u(signature))) return 'The JWT signature does not verify'
  if (claims.aud !== audience) return `The JWT audience is not ${audience}`
  const nowSeconds = Math.floor(now / 1000)
  if (typeof claims.exp !== 'number' || claims.exp <= nowSeconds) return 'The JWT has expired'
  if (claims.exp > nowSeconds + 24 * 3600) return 'The JWT expires more than 24 hours ahead'
  return null
}

/** RFC 8291 with RFC 8188's aes128gcm coding: what a browser does with a push message body. */
export function decryptPushBody(body: Buffer, device: DeviceKeys): Buffer {
  const salt = body.subarray(0, 16)
  const recordSize = body.readUInt32BE(16)
  const idLength = body[20]
  const serverPublic = body.subarray(21, 21 + idLength)
  const ciphertext = body.subarray(21 + idLength)
  if (ciphertext.length > recordSize) throw new Error('More than one record; Web Push sends one')
  const ecdh = createECDH('prime256v1')
  ecdh.setPrivateKey(device.privateKey)
  const secret = ecdh.computeSecret(serverPublic)
  const keyInfo = Buffer.concat([Buffer.from('WebPush: info\0'), device.publicKey, serverPublic])
  const ikm = Buffer.from(hkdfSync('sha256', secret, device.auth, keyInfo, 32))
  const cek = Buffer.from(hkdfSync('sha256', ikm, salt, Buffer.from('Content-Encoding: aes128gcm\0'), 16))
  const nonce = Buffer.from(hkdfSync('sha256', ikm, salt, Buffer.from('Content-Encoding: nonce\0'), 12))
  const decipher = createDecipheriv('aes-128-gcm', cek, nonce)
  decipher.setAuthTag(ciphertext.subarray(ciphertext.length - 16))
  const padded = Buffer.concat([decipher.update(ciphertext.subarray(0, ciphertext.length - 16)), decipher.final()])
  // The last record ends with the delimiter 0x02 then zero padding.
  let end = padded.length - 1
  while (end >= 0 && padded[end] === 0) end--
  if (padded[end] !== 2) throw new Error('The padding delimiter of a last record is missing')
  return padded.subarray(0, end)
}

/**
 * A stand-in push service on loopback (RFC 8030): devices are created here as a browser would
 * (ECDH key pair + auth secret), messages are accepted at `POST /push/:id` only with a valid
 * VAPID header for the application server key the device subscribed with, and each body is
 * decrypted to prove it, then kept. An unknown or removed device answers 410 Gone.
 */
export async function startFakePushService(
  opts: { port?: number; host?: string; /** Keep each message (or refusal) in `push_outbox` for the Outbox page (local mode). */ keep?: boolean } = {},
) {
  const app = express()
  // The body is read as it came: express's body parsers would try to undo the aes128gcm content coding.
  app.use((req, res, next) => {
    const chunks: Buffer[] = []
    let size = 0
    req.on('data', (chunk: Buffer) => {
      size += chunk.length
      if (size <= MAX_BODY) chunks.push(chunk)
    })
    req.on('end', () => {
      if (size > MAX_BODY) return void res.status(413).send('Payload too large')
      req.body = Buffer.concat(chunks)
      next()
    })
  })
  const devices = new Map<string, DeviceKeys & { applicationServerKey: string }>()
  const received: ReceivedPush[] = []

  /** Keeps what happened for the Outbox page; a failure to keep it never changes the answer to the sender. */
  const keep = (row: Omit<PushOutboxRow, 'id' | 'receivedAt'>) =>
    opts.keep
      ? db()
          .getRepository(PushOutboxEntity)
          .insert({ ...row, receivedAt: new Date() })
          .catch((err: unknown) => logger.warn({ err }, 'local push service could not keep a message'))
      : undefined

  app.post('/push/:id', async (req, res) => {
    const endpoint = `${url}/push/${req.params.id}`
    const urgency = req.header('urgency') ?? null
    const refuse = async (status: number, note: string) => {
      await keep({ endpoint, status: 'refused', title: '', body: '', note: `${status}: ${note}`.slice(0, 300), urgency })
      res.status(status).send(note)
    }
    const device = devices.get(req.params.id)
    if (!device) return refuse(410, 'No such subscription')
    const problem = vapidProblem(req.header('authorization'), url, device.applicationServerKey)
    if (problem) return refuse(403, problem)
    if (req.header('content-encoding') !== 'aes128gcm') return refuse(415, 'Only aes128gcm')
    if (req.header('ttl') === undefined) return refuse(400, 'TTL is required')
    let payload: unknown
    try {
      payload = JSON.parse(decryptPushBody(req.body as Buffer, device).toString('utf8'))
    } catch (err) {
      return refuse(400, `Could not decrypt: ${(err as Error).message}`)
    }
    const id = b64u(randomBytes(9))
    received.push({ endpoint, urgency, ttl: Number(req.header('ttl')), payload, receivedAt: new Date() })
    const shown = payload as { title?: unknown; body?: unknown }
    await keep({ endpoint, status: 'received', title: String(shown.title ?? '').slice(0, 300), body: String(shown.body ?? ''), note: null, urgency })
    res.status(201).setHeader('location', `${url}/message/${id}`).end()
  })

  // Local mode: a stand-in device for a person, made here because a browser subscribes at its own vendor's push service.
  app.post('/local/devices', (req, res) => {
    let key: unknown
    try {
      key = (JSON.parse((req.body as Buffer).toString('utf8')) as { applicationServerKey?: unknown }).applicationServerKey
    } catch {
      key = undefined
    }
    if (typeof key !== 'string' || !/^[\w-]{80,100}$/.test(key))
      return void res.status(400).send('applicationServerKey (base64url P-256 public key) is required')
    res.status(201).json(subscribe(key))
  })

  const server = await new Promise<ReturnType<typeof app.listen>>((resolve, reject) => {
    const s = app.listen(opts.port ?? 0, opts.host ?? '127.0.0.1', () => resolve(s))
    s.once('error', reject)
  })
  const url = `http://${opts.host ?? '127.0.0.1'}:${(server.address() as AddressInfo).port}`
  /** What `PushManager.subscribe({ applicationServerKey })` would give a page: a fresh device, its keys kept here. */
  function subscribe(applicationServerKey: string) {
    const ecdh = createECDH('prime256v1')
    ecdh.generateKeys()
    const keys: DeviceKeys = { privateKey: ecdh.getPrivateKey(), publicKey: ecdh.getPublicKey(), auth: randomBytes(16) }
    const id = b64u(randomBytes(12))
    devices.set(id, { ...keys, applicationServerKey })
    return { endpoint: `${url}/push/${id}`, keys: { p256dh: b64u(keys.publicKey), auth: b64u(keys.auth) } }
  }
  return {
    url,
    port: (server.address() as AddressInfo).port,
    received,
    subscribe,
    /** The browser dropped the subscription: later messages to it answer 410. */
    unsubscribe(endpoint: string) {
      devices.delete(endpoint.split('/').pop()!)
    },
    receivedAt: (endpoint: string) => received.filter((r) => r.endpoint === endpoint),
    close: () =>
      new Promise<void>((resolve) => {
        server.closeAllConnections()
        server.close(() => resolve())
      }),
  }
}

export type FakePushService = Awaited<ReturnType<typeof startFakePushService>>
