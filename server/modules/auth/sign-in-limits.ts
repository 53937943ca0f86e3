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
      keyGenerator: (req) => `account:${String(req.body?.email ?? '').trim().toLowerCase()}`,
    }),
  ]
}
