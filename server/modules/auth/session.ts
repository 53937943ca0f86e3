import session from 'express-session'
import MySQLStoreFactory from 'express-mysql-session'
import { escapeId } from 'mysql2'
import type { AppConfig } from '../../lib/config'
import { logger } from '../../lib/logger'
import { SESSION_PERSON_COLUMNS, sessionPersonFrom, type SessionPerson } from '../people/session-person'

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
  readPersonWithSession(store)
  return store
}

/** What the store keeps of its options and its mysql2 pool (express-mysql-session types neither). */
interface StoreInternals {
  options: { schema: { tableName: string; columnNames: Record<'session_id' | 'expires' | 'data', string> } }
  connection: { pool: { execute(sql: string, params: unknown[], callback: (err: Error | null, result: unknown) => void): void } }
}

/** The person each loaded session names, read with it; keyed by the session's `passport.user` object. */
const peopleOfSessions = new WeakMap<object, SessionPerson | null>()

/**
 * What the session's own read found for the person it names (null: nobody by that id), or
 * undefined when the session was not read that way (the caller reads the person itself).
 */
export const personReadWithSession = (stored: object): SessionPerson | null | undefined => peopleOfSessions.get(stored)

/**
 * Every signed-in request read its session and then its person: two round trips before any work.
 * One statement reads both (record 16h); the person is as fresh as the session, read on every
 * request, so a deactivation or password reset still ends older sessions on their next request.
 */
function readPersonWithSession(store: SessionStore) {
  const { options, connection } = store as unknown as StoreInternals
  const { tableName, columnNames } = options.schema
  const sql =
    `SELECT s.${escapeId(columnNames.data)} AS data, s.${escapeId(columnNames.expires)} AS expires, ${SESSION_PERSON_COLUMNS} FROM ${escapeId(tableName)} s ` +
    `LEFT JOIN people p ON p.id = CAST(JSON_VALUE(s.${escapeId(columnNames.data)}, '$.passport.user.id') AS UNSIGNED) WHERE s.${escapeId(columnNames.session_id)} = ?`
  const get = async (sid: string) => {
    // A prepared statement on the store's own pool (its callback side: no stack captured per call).
    const rows = await new Promise<Array<Record<string, unknown>>>((resolve, reject) =>
      connection.pool.execute(sql, [sid], (err, result) => (err ? reject(err) : resolve(result as Array<Record<string, unknown>>))),
    )
    const row = rows[0]
    // Expired sessions read as none, as the store's own get does.
    if (!row || Number(row.expires) < Math.round(Date.now() / 1000)) return null
    const data = (typeof row.data === 'string' ? JSON.parse(row.data) : row.data) as { passport?: { user?: object } }
    const user = data.passport?.user
    if (user && typeof user === 'object') peopleOfSessions.set(user, sessionPersonFrom(row))
    return data
  }
  store.get = ((sid: string, callback?: (error: unknown, session?: unknown) => void) => {
    const done = get(sid)
    if (!callback) return done
    done.then(
      (session) => callback(null, session),
      (err: unknown) => callback(err),
    )
  }) as SessionStore['get']
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
