import { createServer } from 'node:http'
import type { AddressInfo } from 'node:net'
import { createApp } from './app'
import { createDataSource, setDataSource } from './db/data-source'
import type { AppConfig } from './lib/config'
import { createSessionStore } from './modules/auth/session'
import { startScheduler } from './jobs/scheduler'
import { logger } from './lib/logger'
import { withStoredSecrets } from './lib/secrets'
import { startLocalSmtp } from './mail/local-smtp'
import { startFakeTextProvider } from './sms/fake-text-provider'
import { createTextSender } from './sms/text-client'
import { createPushSender } from './push/push-client'
import { startLocalPushIfFree } from './push/local-push'
import { createTransport } from './modules/escalation/deliver'
import { createRedisAdapter } from './realtime/redis-adapter'
import { startPublisher } from './realtime/publisher'
import { attachSocketServer, closeSocketServer } from './realtime/socket-server'

/** Starts the whole server (DB, HTTP, sockets); used by server/index.ts and by browser tests. */
export interface StartOptions {
  clientDir?: string
  scheduler?: boolean
  schedulerIntervalMs?: number
  /** In local mail mode the app runs its own SMTP server unless told not to (or one already runs). */
  localSmtp?: boolean
}

export async function startServer(given: AppConfig, opts: StartOptions = {}) {
  const dataSource = createDataSource(given.db)
  await dataSource.initialize()
  setDataSource(dataSource)
  const stored = await withStoredSecrets(given, dataSource).catch(async (err: unknown) => {
    await dataSource.destroy()
    throw err
  })
  // Local text mode: the provider SDK talks to a stand-in on loopback, started before the app so its URL is known.
  const fakeTexts =
    stored.sms.mode === 'local' && !stored.sms.apiBaseUrl
      ? await startFakeTextProvider({
          accountSid: stored.sms.accountSid,
          authToken: stored.sms.authToken,
          publicUrl: stored.publicUrl,
          port: stored.sms.localPort,
          autoStatus: true,
        })
      : null
  if (fakeTexts) logger.info(`Local text provider on ${fakeTexts.url} (texts are kept for the Outbox page)`)
  // Local push mode: a stand-in push service on loopback, for devices made from the Outbox page.
  const localPush = await startLocalPushIfFree(stored)
  const config = {
    ...stored,
    sms: fakeTexts ? { ...stored.sms, apiBaseUrl: fakeTexts.url } : stored.sms,
    push: { ...stored.push, localUrl: localPush?.url ?? null },
  }
  const sessionStore = createSessionStore(config)
  const { app, sessionMiddleware, passport } = createApp({ config, sessionStore, clientDir: opts.clientDir })
  const server = createServer(app)
  const redis = config.redisUrl ? await createRedisAdapter(config.redisUrl) : null
  attachSocketServer(server, { sessionMiddleware, passport, allowedOrigins: config.allowedOrigins, behindProxy: config.cookieSecure }, redis?.adapter)
  // The store creates its table at start; a sign-in answered before that failed with a 500.
  await sessionStore.onReady()
  await new Promise<void>((resolve) => server.listen(config.port, config.host, resolve))
  const smtp = config.mail.mode === 'local' && opts.localSmtp !== false ? await startLocalSmtpIfFree(config.mail.port, config.mail.host) : null
  // Port 0 asks for a free port (tests); mail then goes to wherever our own server listens.
  const mailConfig = smtp ? { ...config, mail: { ...config.mail, port: smtp.port } } : config
  const transport = createTransport(mailConfig)
  const publisher = startPublisher({ intervalMs: config.publishIntervalMs })
  const channels = { text: createTextSender(config), push: createPushSender(config) }
  const scheduler =
    opts.scheduler === false ? null : startScheduler(dataSource, { mail: { config: mailConfig, transport, channels }, intervalMs: opts.schedulerIntervalMs })
  const { port } = server.address() as AddressInfo
  return {
    url: `http://${config.host}:${port}`,
    port,
    /** The configuration in force, with the secrets generated or read from the database. */
    config,
    scheduler,
    publisher,
    smtpPort: smtp?.port ?? null,
    async stop() {
      await scheduler?.stop()
      await publisher.stop()
      transport.close()
      await smtp?.close()
      await fakeTexts?.close()
      await localPush?.close()
      await closeSocketServer()
      await redis?.close()
      await new Promise<void>((resolve) => server.close(() => resolve()))
      await sessionStore.close()
      await dataSource.destroy()
    },
  }
}

async function startLocalSmtpIfFree(port: number, host: string) {
  try {
    const smtp = await startLocalSmtp(port, host)
    logger.info(`Local SMTP server on ${host}:${smtp.port} (mail is kept for the Outbox page)`)
    return smtp
  } catch (err) {
    // Another Roundtide process on this machine already runs it; send to that one.
    if ((err as { code?: string }).code === 'EADDRINUSE') return null
    throw err
  }
}
