import type { RequestHandler } from 'express'
import { ROLE_LABELS, type Role } from '#shared/schemas/person'
import { forbidden, unauthenticated } from './errors'

/** The one guard for every protected route: signed in, and holding one of the roles. */
export function requireRole(...roles: Role[]): RequestHandler {
  return (req, _res, next) => {
    if (!req.user) return next(unauthenticated())
    if (roles.length && !roles.includes(req.user.role)) {
      const who = roles.map((r) => ROLE_LABELS[r].toLowerCase() + 's').join(' or ')
      return next(forbidden(`Only ${who} can do this; you are signed in as a ${req.user.role}.`))
    }
    next()
  }
}

export const signedIn = requireRole()
