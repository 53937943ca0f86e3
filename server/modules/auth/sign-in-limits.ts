import { rateLimit } from 'express-rate-limit'
import type { AppConfig } from '../../lib/config'

const WINDOW_MS = 15 * 60 * 1000

function tooMany(minutes: number) {
  return {
    error: {
      code: 'rate_limited',
      message: `Too many failed sign-in attempts. Please wait ${minutes} minutes and try again, or ask a manager to reset your password.`,
    },
  }
}

/** Failed sign-ins are limited per address and per account, so neither spraying nor guessing works. */
export function signInLimiters(config: AppConfig) {
  const common = {
    windowMs: WINDOW_MS,
    skipSuccessfulRequests: true,
    standardHeaders: 'draft-8' as const,
    legacyHeaders: false,
    message: tooMany(WINDOW_MS / 60000),
  }
  return [
    rateLimit({ ...common, limit: config.signInLimitPerAddress }),
    rateLimit({
      ...common,
      limit: config.signInLimitPerAccount,
      keyGenerator: (req) =>
        `account:${String(req.body?.email ?? '')
          .trim()
          .toLowerCase()}`,
    }),
  ]
}

/**
 * Failed requests that check a signed-in person's password (changing the sign-in address) are
 * limited per person like sign-ins per account, so an open session cannot be used to guess it.
 */
export function passwordCheckLimiter(config: AppConfig) {
  return rateLimit({
    windowMs: WINDOW_MS,
    skipSuccessfulRequests: true,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    limit: config.signInLimitPerAccount,
    keyGenerator: (req) => `person:${String(req.user?.id)}`,
    message: { error: { code: 'rate_limited', message: `Too many wrong passwords. Please wait ${WINDOW_MS / 60000} minutes and try again.` } },
  })
}
