import session from 'express-session'
import MySQLStoreFactory from 'express-mysql-session'
import type { AppConfig } from '../../lib/config'

const MySQLStore = MySQLStoreFactory(session)

export type SessionStore = InstanceType<typeof MySQLStore>

/** Sessions live in MariaDB so they survive a restart and are shared by every app process. */
export function createSessionStore(config: AppConfig): SessionStore {
  return new MySQLStore({
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
}

export function createSessionMiddleware(config: AppConfig, store: SessionStore) {
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
