import { createServer } from 'node:http'
import type { AddressInfo } from 'node:net'
import { createApp } from './app'
import { createDataSource, setDataSource } from './db/data-source'
import type { AppConfig } from './lib/config'
import { createSessionStore } from './modules/auth/session'
import { startScheduler } from './jobs/scheduler'
import { attachSocketServer, closeSocketServer } from './realtime/socket-server'

/** Starts the whole server (DB, HTTP, sockets); used by server/index.ts and by browser tests. */
export async function startServer(config: AppConfig, opts: { clientDir?: string; scheduler?: boolean } = {}) {
  const dataSource = createDataSource(config.db)
  await dataSource.initialize()
  setDataSource(dataSource)
  const sessionStore = createSessionStore(config)
  const { app, sessionMiddleware, passport } = createApp({ config, sessionStore, clientDir: opts.clientDir })
  const server = createServer(app)
  attachSocketServer(server, sessionMiddleware, passport)
  await new Promise<void>((resolve) => server.listen(config.port, config.host, resolve))
  const scheduler = opts.scheduler === false ? null : startScheduler(dataSource)
  const { port } = server.address() as AddressInfo
  return {
    url: `http://${config.host}:${port}`,
    port,
    scheduler,
    async stop() {
      await scheduler?.stop()
      await closeSocketServer()
      await new Promise<void>((resolve) => server.close(() => resolve()))
      await sessionStore.close()
      await dataSource.destroy()
    },
  }
}
