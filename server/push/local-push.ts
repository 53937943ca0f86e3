import type { AppConfig } from '../lib/config'
import { logger } from '../lib/logger'
import { startFakePushService } from './fake-push-service'

/**
 * Local push mode: the stand-in push service on loopback, keeping what it decrypts for the
 * Outbox page. Its port is fixed (devices made there carry it in their endpoint); when another
 * Roundtide process on this machine already runs it, this one uses that one, as with the local SMTP server.
 */
export async function startLocalPushIfFree(config: AppConfig): Promise<{ url: string; close: () => Promise<void> } | null> {
  if (config.push.mode !== 'local') return null
  try {
    const service = await startFakePushService({ port: config.push.localPort, keep: true })
    logger.info(`Local push service on ${service.url} (pushes are kept for the Outbox page)`)
    return service
  } catch (err) {
    if ((err as { code?: string }).code !== 'EADDRINUSE') throw err
    return { url: `http://127.0.0.1:${config.push.localPort}`, close: async () => undefined }
  }
}
