import { ServerResponse, type IncomingMessage, type Server as HttpServer } from 'node:http'
import type { RequestHandler } from 'express'
import type { PassportStatic } from 'passport'
import { Server } from 'socket.io'
import { logger } from '../lib/logger'
import { isAllowedOrigin } from '../modules/auth/same-origin'

let io: Server | undefined

export const FACILITY_ROOM = 'facility'
const personRoom = (personId: number) => `person:${personId}`
const sessionRoom = (sessionId: string) => `session:${sessionId}`

export interface SocketAuth {
  sessionMiddleware: RequestHandler
  passport: PassportStatic
  /** Extra browser origins allowed besides this site itself (ROUNDTIDE_ALLOWED_ORIGINS). */
  allowedOrigins: readonly string[]
  /** Behind a TLS proxy (ROUNDTIDE_COOKIE_SECURE): the site's own origin is https. */
  behindProxy: boolean
}

type AuthedRequest = IncomingMessage & { user?: Express.User; sessionID?: string }
type Authenticated = { user: Express.User; sessionId: string } | null

/**
 * Every socket is authenticated from its own handshake request: the session cookie is read
 * and the person loaded (active, current session version) whatever the transport or the query
 * string says. The result is kept per request, so the engine's handshake check and the
 * namespace middleware share one database look-up.
 */
function handshakeAuthenticator({ sessionMiddleware, passport }: SocketAuth) {
  const results = new WeakMap<IncomingMessage, Promise<Authenticated>>()
  const run = (mw: RequestHandler, req: AuthedRequest) =>
    new Promise<void>((resolve, reject) => {
      // Nothing is ever written to this response; the middlewares only need one to hook into.
      mw(req as Parameters<RequestHandler>[0], new ServerResponse(req) as Parameters<RequestHandler>[1], (err?: unknown) => (err ? reject(err) : resolve()))
    })
  return (req: AuthedRequest): Promise<Authenticated> => {
    let result = results.get(req)
    if (!result) {
      result = (async () => {
        await run(sessionMiddleware, req)
        await run(passport.session() as RequestHandler, req)
        return req.user && req.sessionID ? { user: req.user, sessionId: req.sessionID } : null
      })()
      results.set(req, result)
    }
    return result
  }
}

function originAllowed(req: IncomingMessage, auth: SocketAuth) {
  const origin = req.headers.origin
  // Like the API: tools without a browser send no Origin and carry no ambient cookies.
  if (origin === undefined) return true
  const forwarded = auth.behindProxy
    ? String(req.headers['x-forwarded-proto'] ?? '')
        .split(',')[0]
        .trim()
    : ''
  const protocol = forwarded || ('encrypted' in req.socket && req.socket.encrypted ? 'https' : 'http')
  return isAllowedOrigin(origin, `${protocol}://${req.headers.host}`, auth.allowedOrigins)
}

/** Socket.io on the app's own HTTP server; a connection without a signed-in session is refused. */
export function attachSocketServer(server: HttpServer, auth: SocketAuth, adapter?: Parameters<Server['adapter']>[0]) {
  const authenticate = handshakeAuthenticator(auth)
  io = new Server(server, {
    serveClient: false,
    ...(adapter ? { adapter } : {}),
    // Runs for every new engine session (any transport): a foreign page or no session gets 403 at once.
    allowRequest: (req, callback) => {
      if (!originAllowed(req, auth)) return callback('This connection came from another site and was refused.', false)
      authenticate(req).then(
        (who) => callback(who ? null : 'Please sign in first.', who !== null),
        (err: unknown) => {
          logger.warn({ err }, 'socket handshake could not be authenticated')
          callback('Please sign in first.', false)
        },
      )
    },
  })
  // The gate that counts: no socket joins a room unless its own handshake names a signed-in person.
  io.use((socket, next) => {
    if (!originAllowed(socket.request, auth)) return next(new Error('This connection came from another site and was refused.'))
    authenticate(socket.request).then(
      (who) => {
        if (!who) return next(new Error('Please sign in first.'))
        socket.data.personId = who.user.id
        void socket.join([FACILITY_ROOM, personRoom(who.user.id), sessionRoom(who.sessionId)])
        next()
      },
      () => next(new Error('Please sign in first.')),
    )
  })
  io.on('connection', (socket) => {
    logger.debug({ user: socket.data.personId as number }, 'socket connected')
  })
  return io
}

/** Tells every connected client in the facility that something changed. */
export function broadcast(event: string, payload: unknown) {
  io?.to(FACILITY_ROOM).emit(event, payload)
}

/** Ends the live feed of one signed-out session (on every app process, through the adapter). */
export function disconnectSession(sessionId: string) {
  io?.in(sessionRoom(sessionId)).disconnectSockets(true)
}

/** Ends every live feed of a person whose sessions just ended (deactivated, password reset). */
export function disconnectPerson(personId: number) {
  io?.in(personRoom(personId)).disconnectSockets(true)
}

export function closeSocketServer() {
  return new Promise<void>((resolve) => (io ? io.close(() => resolve()) : resolve()))
}
