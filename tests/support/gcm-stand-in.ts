import { createServer, type IncomingMessage } from 'node:http'
import type { AddressInfo } from 'node:net'
import os from 'node:os'
import path from 'node:path'
import { mkdtemp, rm } from 'node:fs/promises'
import { chromium, type BrowserContext } from 'playwright-core'

export interface GcmRequest {
  path: string
  authorization: string | null
  form: Record<string, string>
}

/** A protobuf fixed64 field (wire type 1). */
const fixed64 = (field: number, value: bigint) => {
  const b = Buffer.alloc(9)
  b[0] = (field << 3) | 1
  b.writeBigUInt64LE(value, 1)
  return b
}

/**
 * A stand-in for the two HTTP endpoints Chromium's GCM client calls before `PushManager.subscribe`
 * resolves: device check-in (protobuf `AndroidCheckinResponse`: stats_ok = 1, android_id = 7,
 * security_token = 8, as in Chromium's google_apis/gcm/protocol/checkin.proto) and registration
 * (a form post answered `token=…`). Chromium is pointed here with `--gcm-checkin-url` and
 * `--gcm-registration-url`. Its message channel (MCS, TLS on a long-lived socket) is not stood in
 * for, so nothing is delivered through it; a push reaches the worker by CDP instead.
 */
export async function startGcmStandIn() {
  const requests: GcmRequest[] = []
  let refuse = false
  const server = createServer((req: IncomingMessage, res) => {
    const chunks: Buffer[] = []
    req.on('data', (c: Buffer) => chunks.push(c))
    req.on('end', () => {
      const body = Buffer.concat(chunks)
      const form = req.url === '/register' ? Object.fromEntries(new URLSearchParams(body.toString('utf8'))) : {}
      requests.push({ path: req.url ?? '', authorization: req.headers.authorization ?? null, form })
      if (req.url === '/checkin') {
        res.writeHead(200, { 'content-type': 'application/x-protobuf' })
        return void res.end(Buffer.concat([Buffer.from([0x08, 0x01]), fixed64(7, 4_200_000_000_001n), fixed64(8, 7_300_000_000_002n)]))
      }
      if (req.url === '/register') {
        res.writeHead(200, { 'content-type': 'text/plain' })
        // A sender the service will not register: a final refusal, which Chromium does not retry.
        return void res.end(refuse ? 'Error=INVALID_SENDER' : `token=stand-in-${requests.length}:APA91b${'x'.repeat(40)}`)
      }
      res.writeHead(404).end()
    })
  })
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve))
  const url = `http://127.0.0.1:${(server.address() as AddressInfo).port}`
  return {
    url,
    requests,
    /** Web Push registrations (Chromium also registers an internal sender of its own first). */
    webPushRegistrations: () => requests.filter((r) => r.path === '/register' && r.form['X-subtype']?.startsWith('wp:')),
    refuseRegistrations: (value: boolean) => void (refuse = value),
    /** Switches that send Chromium's GCM client here; its message channel goes to a closed port. */
    chromiumArgs: () => [`--gcm-checkin-url=${url}/checkin`, `--gcm-registration-url=${url}/register`, '--gcm-mcs-endpoint=https://127.0.0.1:9'],
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  }
}

export type GcmStandIn = Awaited<ReturnType<typeof startGcmStandIn>>

/**
 * Chromium with a profile on disk: Playwright's `browser.newContext()` is off the record, where
 * Chromium refuses push subscriptions outright ("Registration failed - permission denied").
 */
export async function launchPushProfile(gcm: GcmStandIn, opts: { baseURL: string; viewport: { width: number; height: number } }) {
  const dir = await mkdtemp(path.join(os.tmpdir(), 'roundtide-push-profile-'))
  const context: BrowserContext = await chromium.launchPersistentContext(dir, {
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    headless: true,
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
      '--no-first-run',
      '--disable-quic',
      ...gcm.chromiumArgs(),
    ],
    serviceWorkers: 'allow',
    ...opts,
  })
  await context.grantPermissions(['notifications'], { origin: opts.baseURL })
  return {
    context,
    async close() {
      await context.close()
      await rm(dir, { recursive: true, force: true })
    },
  }
}
