import { randomBytes } from 'node:crypto'
import type { DataSource } from 'typeorm'
import webpush from 'web-push'
import type { AppConfig } from './config'
import { logger } from './logger'

/** Secrets that once shipped as defaults in the public source: never good enough to sign with. */
const PUBLISHED_DEFAULTS = new Set(['roundtide-local-session-secret-change-me'])
export const MIN_SECRET_LENGTH = 32
const DEFAULT_DB_PASSWORD = 'roundtide-local'
const LOOPBACK = new Set(['127.0.0.1', 'localhost', '::1'])

type SecretName = 'session' | 'ack' | 'sms_local' | 'vapid'
const VARIABLES: Record<'session' | 'ack', string> = { session: 'ROUNDTIDE_SESSION_SECRET', ack: 'ROUNDTIDE_ACK_SECRET' }

export class UnsafeConfigError extends Error {}

/** Why a secret given in the environment is unsafe, or null when it is fine. */
export function weakSecretReason(value: string): string | null {
  if (PUBLISHED_DEFAULTS.has(value)) return 'is a default published in the source code'
  if (value.length < MIN_SECRET_LENGTH) return `is shorter than ${MIN_SECRET_LENGTH} characters`
  return null
}

/**
 * The database keeps one generated secret per name (256 random bits). INSERT IGNORE then SELECT
 * means several processes starting at once on one database all end up with the same value.
 */
async function storedSecret(dataSource: DataSource, name: SecretName, generate = () => randomBytes(32).toString('base64url')): Promise<string> {
  await dataSource.query('INSERT IGNORE INTO app_secrets (name, value) VALUES (?, ?)', [name, generate()])
  const [row] = (await dataSource.query('SELECT value FROM app_secrets WHERE name = ?', [name])) as Array<{ value: string }>
  return row.value
}

function refuseOrWarn(config: AppConfig, problem: string) {
  if (config.env === 'production') throw new UnsafeConfigError(`Roundtide will not start: ${problem}`)
  logger.warn(`${problem} (allowed outside production only)`)
}

/**
 * Fills in the cookie and acknowledge keys: from the environment when set there (and strong),
 * otherwise generated on first start and kept in the database, so `npm start` is safe as it is.
 * In production a default, short or shared secret, or the default database password on a
 * database that is not on this machine, stops the start with a message saying what to fix.
 */
export async function withStoredSecrets(config: AppConfig, dataSource: DataSource): Promise<AppConfig> {
  const given: Record<'session' | 'ack', string> = { session: config.sessionSecret, ack: config.ackSecret }
  const resolved = { ...given }
  for (const name of ['session', 'ack'] as const) {
    if (!given[name]) {
      resolved[name] = await storedSecret(dataSource, name)
      continue
    }
    const reason = weakSecretReason(given[name])
    if (reason)
      refuseOrWarn(
        config,
        `${VARIABLES[name]} ${reason}. Set at least ${MIN_SECRET_LENGTH} random characters, or unset it and Roundtide generates and keeps one.`,
      )
  }
  if (resolved.session === resolved.ack) refuseOrWarn(config, 'ROUNDTIDE_SESSION_SECRET and ROUNDTIDE_ACK_SECRET must differ.')
  if (config.db.password === DEFAULT_DB_PASSWORD && !LOOPBACK.has(config.db.host)) {
    refuseOrWarn(config, `the database at ${config.db.host} uses the default password; set ROUNDTIDE_DB_PASSWORD.`)
  }
  if (config.sms.mode === 'twilio' && (!config.sms.accountSid || !config.sms.authToken)) {
    throw new UnsafeConfigError('Roundtide will not start: ROUNDTIDE_SMS_MODE=twilio needs TWILIO_ACCOUNT_SID and TWILIO_AUTH_TOKEN.')
  }
  // The local stand-in signs its callbacks with a token of its own, kept so every process agrees.
  const smsToken = config.sms.authToken || (config.sms.mode === 'local' ? await storedSecret(dataSource, 'sms_local') : '')
  // The push key pair (VAPID, RFC 8292) is generated once and kept: every browser subscribed with its public half.
  const vapid = config.push.enabled
    ? (JSON.parse(await storedSecret(dataSource, 'vapid', () => JSON.stringify(webpush.generateVAPIDKeys()))) as { publicKey: string; privateKey: string })
    : null
  return { ...config, sessionSecret: resolved.session, ackSecret: resolved.ack, sms: { ...config.sms, authToken: smsToken }, push: { ...config.push, vapid } }
}
