import session from 'express-session'
import MySQLStoreFactory from 'express-mysql-session'
import type { AppConfig } from '../../lib/config'
import { logger } from '../../lib/logger'

const MySQLStore = MySQLStoreFactory(session)

export type SessionStore = InstanceType<typeof MySQLStore>

const TOUCH_EVERY_MS = 60_000
/** Sessions remembered as recently refreshed; forgetting them all only costs one refresh each. */
const TOUCH_MEMORY = 10_000

/** Sessions live in MariaDB so they survive a restart and are shared by every app process. */
export function createSessionStore(config: AppConfig): SessionStore {
  const store = new MySQLStore({
    host: config.db.host,
    port: config.db.port,
    user: config.db.username,
    password: config.db.password,
    database: config.db.database,
    createDatabaseTable: true,
    clearExpired: true,
    checkExpirationInterval: 15 * 60 * 1000,
    expiration: 7 * 24 * 60 * 60 * 1000,
  })
  // express-session refreshes the expiry (rolling) on every answer and ends the response only
  // when that write returns: one more round trip per request for a 7-day expiry. Refresh a session
  // at most once a minute per process. A failed refresh (the database just went away) would make
  // it cut the connection, so a stored completion reached the phone as a dropped request: the
  // session simply keeps its previous expiry.
  const touch = store.touch.bind(store) as (sid: string, data: unknown) => Promise<void>
  const lastTouched = new Map<string, number>()
  store.touch = ((sid: string, data: unknown, callback?: (error: unknown) => void) => {
    const now = Date.now()
    if (now - (lastTouched.get(sid) ?? 0) < TOUCH_EVERY_MS) return callback ? void callback(null) : Promise.resolve()
    if (lastTouched.size >= TOUCH_MEMORY) lastTouched.clear()
    lastTouched.set(sid, now)
    const done = touch(sid, data).catch((err: unknown) => {
      lastTouched.delete(sid)
      logger.warn({ err }, 'session expiry not refreshed')
    })
    return callback ? void done.then(() => callback(null)) : done
  }) as SessionStore['touch']
  return store
}

export function createSessionMiddleware(config: AppConfig, store: SessionStore) {
  // Never sign cookies with an empty key: the secrets are filled in by withStoredSecrets at start.
  if (!config.sessionSecret) throw new Error('The session secret is not set; start through startServer or withStoredSecrets.')
  return session({
    name: 'roundtide.sid',
    secret: config.sessionSecret,
    store,
    resave: false,
    saveUninitialized: false,
    rolling: true,
    proxy: config.cookieSecure,
    cookie: {
      httpOnly: true,
      sameSite: 'lax',
      secure: config.cookieSecure,
      maxAge: 7 * 24 * 60 * 60 * 1000,
    },
  })
}
