import type { Server as HttpServer } from 'node:http'
import type { RequestHandler } from 'express'
import type { PassportStatic } from 'passport'
import { Server } from 'socket.io'
import { logger } from '../lib/logger'

let io: Server | undefined

type HandshakeRequest = Parameters<RequestHandler>[0] & { _query?: Record<string, string> }

// Session and passport run on the handshake only (socket.io's documented pattern with passport).
const onlyForHandshake = (mw: RequestHandler): RequestHandler => (req, res, next) =>
  (req as HandshakeRequest)._query?.sid === undefined ? mw(req, res, next) : next()

export const FACILITY_ROOM = 'facility'

/** Socket.io on the app's own HTTP server; a connection without a signed-in session is refused. */
export function attachSocketServer(server: HttpServer, sessionMiddleware: RequestHandler, passport: PassportStatic, adapter?: Parameters<Server['adapter']>[0]) {
  io = new Server(server, { serveClient: false, ...(adapter ? { adapter } : {}) })
  io.engine.use(onlyForHandshake(sessionMiddleware))
  io.engine.use(onlyForHandshake(passport.session() as RequestHandler))
  io.engine.use(
    onlyForHandshake((req, res, next) => {
      if (req.user) return next()
      res.writeHead(401, { 'content-type': 'application/json' })
      res.end(JSON.stringify({ error: { code: 'unauthenticated', message: 'Please sign in first.' } }))
    }),
  )
  io.on('connection', (socket) => {
    void socket.join(FACILITY_ROOM)
    logger.debug({ user: (socket.request as { user?: { id: number } }).user?.id }, 'socket connected')
  })
  return io
}

/** Tells every connected client in the facility that something changed. */
export function broadcast(event: string, payload: unknown) {
  io?.to(FACILITY_ROOM).emit(event, payload)
}

export function closeSocketServer() {
  return new Promise<void>((resolve) => (io ? io.close(() => resolve()) : resolve()))
}
