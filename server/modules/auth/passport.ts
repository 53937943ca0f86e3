import passport from 'passport'
import { Strategy as LocalStrategy } from 'passport-local'
import { getPersonRow, verifyCredentials } from '../people/people.service'
import { toPerson } from '../people/person.mapper'
import type { Person } from '#shared/schemas/person'
import { personReadWithSession } from './session'

interface SessionUser {
  id: number
  v: number
}

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    interface User extends Person {
      sessionVersion?: number
    }
  }
}

let configured = false

export function configurePassport() {
  if (configured) return passport
  configured = true
  passport.use(
    new LocalStrategy({ usernameField: 'email', passwordField: 'password' }, (email, password, done) => {
      verifyCredentials(email, password)
        .then((row) => done(null, row ? { ...toPerson(row), sessionVersion: row.sessionVersion } : false))
        .catch(done)
    }),
  )
  passport.serializeUser((user, done) => {
    done(null, { id: user.id, v: user.sessionVersion ?? 0 } satisfies SessionUser)
  })
  passport.deserializeUser((stored: SessionUser, done) => {
    const read = personReadWithSession(stored)
    if (read !== undefined) {
      // Read in the session's own statement (record 16h); the same checks as below.
      if (!read || !read.active || read.sessionVersion !== stored.v) return done(null, false)
      return done(null, { ...read.person, sessionVersion: read.sessionVersion })
    }
    getPersonRow(stored.id)
      .then((row) => {
        // A deactivated person or a reset password ends every older session.
        if (!row.active || row.sessionVersion !== stored.v) return done(null, false)
        done(null, { ...toPerson(row), sessionVersion: row.sessionVersion })
      })
      .catch((err: { status?: number }) => (err?.status === 404 ? done(null, false) : done(err)))
  })
  return passport
}
