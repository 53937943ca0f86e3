import express from 'express'
import helmet from 'helmet'
import { pinoHttp } from 'pino-http'
import { randomUUID } from 'node:crypto'
import { existsSync } from 'node:fs'
import path from 'node:path'
import { noStore } from './lib/cache-control'
import { compress } from './lib/compress'
import type { AppConfig } from './lib/config'
import { errorHandler } from './lib/error-handler'
import { notFound } from './lib/errors'
import { requestContext } from './lib/request-context'
import { requestTransaction } from './db/request-transaction'
import { logger } from './lib/logger'
import { authRouter } from './modules/auth/auth.routes'
import { configurePassport } from './modules/auth/passport'
import { requireSameOrigin } from './modules/auth/same-origin'
import { createSessionMiddleware, type SessionStore } from './modules/auth/session'
import { healthRouter } from './modules/health/health.routes'
import { completionsRouter } from './modules/completions/completions.routes'
import { ackRouter } from './modules/escalation/ack-page'
import { escalationRouter } from './modules/escalation/escalation.routes'
import { textHooksRouter } from './modules/escalation/text-hooks'
import { facilityRouter } from './modules/facility/facility.routes'
import { parametersRouter } from './modules/parameters/parameters.routes'
import { peopleRouter, staffRouter } from './modules/people/people.routes'
import { rosterRouter } from './modules/roster/roster.routes'
import { incidentsRouter } from './modules/incidents/incidents.routes'
import { oxygenRouter } from './modules/oxygen/oxygen.routes'
import { playbooksRouter } from './modules/playbooks/playbooks.routes'
import { reportsRouter } from './modules/reports/reports.routes'
import { routinesRouter } from './modules/routines/routines.routes'
import { stockRouter } from './modules/stock/stock.routes'
import { tasksRouter } from './modules/tasks/tasks.routes'
import { taskMovesRouter } from './modules/scheduling/scheduling.routes'
import { subscribeModules } from './module-subscriptions'

/**
 * State-changing routes that do not run in one request-long transaction: signing in and out
 * (the session store keeps its own connection), uploads (the body streams in after the route
 * starts, and would hold a connection meanwhile) and the tank import, which commits its tanks
 * and then plans their tasks tank by tank. Each commits its own writes as it goes.
 */
const UNWRAPPED_WRITES = [/^\/session$/, /^\/tasks\/\d+\/photos$/, /^\/tanks\/import$/]

export interface AppDeps {
  config: AppConfig
  sessionStore: SessionStore
  /** Folder of the built client; served with a fallback to index.html when present. */
  clientDir?: string
}

/** Builds the Express app without listening, so tests can drive it in process. */
export function createApp({ config, sessionStore, clientDir }: AppDeps) {
  subscribeModules()
  const app = express()
  const passport = configurePassport()
  const sessionMiddleware = createSessionMiddleware(config, sessionStore)

  if (config.cookieSecure) app.set('trust proxy', 1)
  app.disable('x-powered-by')
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: { 'img-src': ["'self'", 'data:', 'blob:'], 'connect-src': ["'self'", 'ws:', 'wss:'] },
      },
    }),
  )
  // The board of a large facility is hundreds of kB of JSON and the client bundle is half a megabyte.
  app.use(compress())
  app.use(
    pinoHttp({
      logger,
      genReqId: (_req, res) => {
        const id = randomUUID()
        res.setHeader('x-request-id', id)
        return id
      },
      autoLogging: { ignore: (req) => req.url === '/api/health' },
    }),
  )

  const api = express.Router()
  api.use(noStore)
  api.use(express.json({ limit: '256kb' }))
  api.use(requireSameOrigin(config.allowedOrigins))
  api.use('/health', healthRouter)
  api.use(sessionMiddleware, passport.session(), requestContext, requestTransaction(UNWRAPPED_WRITES))
  api.use('/', authRouter(config))
  api.use('/people', peopleRouter)
  api.use('/staff', staffRouter)
  api.use('/', facilityRouter)
  api.use('/', parametersRouter)
  api.use('/routines', routinesRouter)
  api.use('/tasks', tasksRouter)
  api.use('/tasks', taskMovesRouter)
  api.use('/', completionsRouter(config))
  api.use('/', rosterRouter)
  api.use('/', escalationRouter(config))
  api.use('/', playbooksRouter)
  api.use('/', oxygenRouter)
  api.use('/', reportsRouter)
  api.use('/', stockRouter)
  api.use('/', incidentsRouter)
  api.use((req: express.Request) => {
    throw notFound(`The API route ${req.method} ${req.path}`)
  })
  app.use('/api', api)
  // The text provider posts here from its own servers: no session and no Origin (so the same-origin
  // check lets it through while still refusing a browser on another site); its signature is the check.
  app.use('/hooks/sms', express.urlencoded({ extended: false, limit: '16kb' }), requireSameOrigin(config.allowedOrigins), textHooksRouter(config))
  app.use('/ack', noStore, express.urlencoded({ extended: false, limit: '4kb' }), requireSameOrigin(config.allowedOrigins), ackRouter(config))

  if (clientDir && existsSync(path.join(clientDir, 'index.html'))) {
    app.use(
      express.static(clientDir, {
        index: false,
        maxAge: '1h',
        // The service worker must be re-checked on every visit, or updates reach phones an hour late.
        setHeaders: (res, file) => {
          if (/(?:^|\/)(sw|registerSW|workbox-[\w-]+)\.js$/.test(file) || file.endsWith('.webmanifest')) res.setHeader('cache-control', 'no-cache')
          // Vite names everything under assets/ by its content hash: a changed file is a new name, so a phone may keep these for good.
          else if (file.startsWith(path.resolve(clientDir, 'assets') + path.sep)) res.setHeader('cache-control', 'public, max-age=31536000, immutable')
        },
      }),
    )
    app.get(/^\/(?!api\/|socket\.io\/).*/, (_req, res) => {
      res.setHeader('cache-control', 'no-cache')
      res.sendFile(path.join(clientDir, 'index.html'))
    })
  }
  app.use(errorHandler)
  return { app, sessionMiddleware, passport }
}
