import type { RequestHandler } from 'express'

/**
 * API answers and exports carry personal data (names, readings, who did what): no browser,
 * proxy or shared computer keeps a copy. Routes that may be kept say so themselves.
 */
export const noStore: RequestHandler = (_req, res, next) => {
  res.setHeader('cache-control', 'no-store')
  next()
}

/** A photo never changes under its id; only the signed-in person's own browser may keep it, for a day. */
export const PHOTO_CACHE_CONTROL = 'private, max-age=86400'
