import type { RequestHandler } from 'express'
import { forbidden } from '../../lib/errors'

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS'])

/** True when a browser's Origin is this site itself or one of the configured extra origins. */
export function isAllowedOrigin(origin: string, ownOrigin: string, allowedOrigins: readonly string[]) {
  return origin === ownOrigin || allowedOrigins.includes(origin)
}

/**
 * CSRF defence, part two (part one is the SameSite=Lax session cookie): a state-changing
 * request that names an Origin (or, failing that, a Referer) must come from this site.
 * Browsers always send Origin on cross-origin POST/PATCH/PUT/DELETE, so a forged form or
 * fetch from another site is refused here; tools without a browser send neither header.
 */
export function requireSameOrigin(allowedOrigins: string[]): RequestHandler {
  return (req, _res, next) => {
    if (SAFE_METHODS.has(req.method)) return next()
    const origin = req.get('origin') ?? originOf(req.get('referer'))
    if (!origin) return next()
    if (isAllowedOrigin(origin, `${req.protocol}://${req.get('host')}`, allowedOrigins)) return next()
    next(forbidden('This request came from another site and was refused.'))
  }
}

function originOf(url: string | undefined): string | undefined {
  if (!url) return undefined
  try {
    return new URL(url).origin
  } catch {
    return 'invalid'
  }
}
