import { z } from 'zod'
import { text } from '#shared/schemas/text'

const EnvSchema = z.object({
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  HOST: text().default('127.0.0.1'),
  PORT: z.coerce.number().int().min(0).max(65535).default(8080),
  ROUNDTIDE_PUBLIC_URL: text().url().optional(),
  ROUNDTIDE_DB_HOST: text().default('127.0.0.1'),
  ROUNDTIDE_DB_PORT: z.coerce.number().int().default(3307),
  ROUNDTIDE_DB_NAME: text().default('roundtide'),
  ROUNDTIDE_DB_USER: text().default('roundtide'),
  ROUNDTIDE_DB_PASSWORD: text().default('roundtide-local'),
  /** Unset (the usual case): Roundtide generates strong secrets on first start and keeps them in the database. */
  ROUNDTIDE_SESSION_SECRET: text().optional(),
  ROUNDTIDE_ACK_SECRET: text().optional(),
  ROUNDTIDE_COOKIE_SECURE: z.enum(['true', 'false']).default('false'),
  ROUNDTIDE_ALLOWED_ORIGINS: text().default(''),
  ROUNDTIDE_SIGNIN_LIMIT_PER_ADDRESS: z.coerce.number().int().min(1).default(50),
  ROUNDTIDE_SIGNIN_LIMIT_PER_ACCOUNT: z.coerce.number().int().min(1).default(8),
  ROUNDTIDE_UPLOAD_DIR: text().default('.data/uploads'),
  ROUNDTIDE_DEMO_PASSWORD: text().min(8).default('tidepool-demo'),
  ROUNDTIDE_MAIL_MODE: z.enum(['local', 'smtp']).default('local'),
  ROUNDTIDE_SMTP_HOST: text().default('127.0.0.1'),
  ROUNDTIDE_SMTP_PORT: z.coerce.number().int().min(0).max(65535).default(2525),
  ROUNDTIDE_SMTP_USER: text().optional(),
  ROUNDTIDE_SMTP_PASSWORD: text().optional(),
  ROUNDTIDE_MAIL_FROM: text().default('Roundtide <roundtide@localhost>'),
  ROUNDTIDE_ACK_TTL_HOURS: z.coerce
    .number()
    .min(1)
    .max(24 * 14)
    .default(72),
  /** Text messages: `local` (default) runs a stand-in provider on loopback; `twilio` sends for real; `off` sends none. */
  ROUNDTIDE_SMS_MODE: z.enum(['local', 'twilio', 'off']).default('local'),
  /** The provider's API base URL; unset means the SDK's own. Local mode points it at the stand-in. */
  ROUNDTIDE_SMS_API_URL: text().url().optional(),
  ROUNDTIDE_SMS_LOCAL_PORT: z.coerce.number().int().min(0).max(65535).default(0),
  ROUNDTIDE_SMS_FROM: text().default('+15555550100'),
  ROUNDTIDE_SMS_MAX_PER_HOUR: z.coerce.number().int().min(1).max(1000).default(6),
  TWILIO_ACCOUNT_SID: text().optional(),
  TWILIO_AUTH_TOKEN: text().optional(),
  /** Web Push: `local` (default) also runs a stand-in push service on loopback; `on` sends to subscribed devices only; `off` sends none. The contact in the VAPID claim. */
  ROUNDTIDE_PUSH_MODE: z.enum(['local', 'on', 'off']).default('local'),
  /** The local push service's port: fixed, because the devices made there keep it in their endpoint. */
  ROUNDTIDE_PUSH_LOCAL_PORT: z.coerce.number().int().min(0).max(65535).default(2527),
  ROUNDTIDE_PUSH_SUBJECT: text()
    .regex(/^(mailto:|https:\/\/)/, 'Use a mailto: address or an https: URL')
    .default('mailto:roundtide@example.org'),
  /** Set to share live events between several app processes (socket.io's Redis adapter). */
  ROUNDTIDE_REDIS_URL: text().url().optional(),
  /** How often the background scheduler ticks (status clock, escalations, mail); 30 s unless set. */
  ROUNDTIDE_SCHEDULER_INTERVAL_MS: z.coerce.number().int().min(100).max(3_600_000).default(30_000),
  /** How often the live-event publisher looks for unsent changes besides after each commit (and its first look after start). */
  ROUNDTIDE_PUBLISH_INTERVAL_MS: z.coerce.number().int().min(100).max(600_000).default(2_000),
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
})

/** The stand-in provider's account (local mode); the SDK insists on the AC prefix. */
export const LOCAL_ACCOUNT_SID = 'AC00000000000000000000000000000000'

export type AppConfig = ReturnType<typeof loadConfig>

export function loadConfig(env: NodeJS.ProcessEnv = process.env) {
  const e = EnvSchema.parse(env)
  return {
    env: e.NODE_ENV,
    host: e.HOST,
    port: e.PORT,
    publicUrl: e.ROUNDTIDE_PUBLIC_URL ?? `http://${e.HOST}:${e.PORT}`,
    db: {
      host: e.ROUNDTIDE_DB_HOST,
      port: e.ROUNDTIDE_DB_PORT,
      database: e.ROUNDTIDE_DB_NAME,
      username: e.ROUNDTIDE_DB_USER,
      password: e.ROUNDTIDE_DB_PASSWORD,
    },
    /** Signs session cookies; empty until `withStoredSecrets` fills it from the database. */
    sessionSecret: e.ROUNDTIDE_SESSION_SECRET ?? '',
    /** Signs acknowledge links in mail; a key of its own, so a cookie key never signs an acknowledgement. */
    ackSecret: e.ROUNDTIDE_ACK_SECRET ?? '',
    cookieSecure: e.ROUNDTIDE_COOKIE_SECURE === 'true',
    allowedOrigins: e.ROUNDTIDE_ALLOWED_ORIGINS.split(',')
      .map((o) => o.trim())
      .filter(Boolean),
    signInLimitPerAddress: e.ROUNDTIDE_SIGNIN_LIMIT_PER_ADDRESS,
    signInLimitPerAccount: e.ROUNDTIDE_SIGNIN_LIMIT_PER_ACCOUNT,
    uploadDir: e.ROUNDTIDE_UPLOAD_DIR,
    demoPassword: e.ROUNDTIDE_DEMO_PASSWORD,
    logLevel: e.LOG_LEVEL,
    redisUrl: e.ROUNDTIDE_REDIS_URL ?? null,
    schedulerIntervalMs: e.ROUNDTIDE_SCHEDULER_INTERVAL_MS,
    sms: {
      mode: e.ROUNDTIDE_SMS_MODE,
      apiBaseUrl: e.ROUNDTIDE_SMS_API_URL ?? null,
      localPort: e.ROUNDTIDE_SMS_LOCAL_PORT,
      from: e.ROUNDTIDE_SMS_FROM,
      maxPerHour: e.ROUNDTIDE_SMS_MAX_PER_HOUR,
      // Local mode has an account of its own; its token is generated and kept like the other secrets.
      accountSid: e.TWILIO_ACCOUNT_SID ?? (e.ROUNDTIDE_SMS_MODE === 'local' ? LOCAL_ACCOUNT_SID : ''),
      authToken: e.TWILIO_AUTH_TOKEN ?? '',
    },
    publishIntervalMs: e.ROUNDTIDE_PUBLISH_INTERVAL_MS,
    push: {
      enabled: e.ROUNDTIDE_PUSH_MODE !== 'off',
      mode: e.ROUNDTIDE_PUSH_MODE,
      localPort: e.ROUNDTIDE_PUSH_LOCAL_PORT,
      /** Where the local push service listens, once started (local mode); its Outbox and stand-in devices need it. */
      localUrl: null as string | null,
      subject: e.ROUNDTIDE_PUSH_SUBJECT,
      /** Filled by `withStoredSecrets` from the database (generated on first start). */
      vapid: null as { publicKey: string; privateKey: string } | null,
    },
    mail: {
      mode: e.ROUNDTIDE_MAIL_MODE,
      host: e.ROUNDTIDE_SMTP_HOST,
      port: e.ROUNDTIDE_SMTP_PORT,
      user: e.ROUNDTIDE_SMTP_USER,
      password: e.ROUNDTIDE_SMTP_PASSWORD,
      from: e.ROUNDTIDE_MAIL_FROM,
      ackTtlHours: e.ROUNDTIDE_ACK_TTL_HOURS,
    },
  }
}
