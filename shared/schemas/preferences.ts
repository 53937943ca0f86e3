import { z } from 'zod'
import { ChannelSchema } from './ladder'
import { text } from './text'

const hhmm = text().regex(/^([01]\d|2[0-3]):[0-5]\d$/, 'Use HH:MM, 24-hour')
/** E.164: a plus, the country code and the number, digits only (what text providers take). */
export const PhoneSchema = text()
  .trim()
  .regex(/^\+[1-9]\d{6,14}$/, 'Use the international form, e.g. +447700900123')

/** How escalations reach me: my addresses, the channels I accept and my quiet hours. */
export const PreferencesSchema = z.object({
  email: text(),
  phone: text().nullable(),
  channels: z.array(ChannelSchema),
  quietStart: text().nullable(),
  quietEnd: text().nullable(),
  /** Whether this server can send texts / push at all, so the page does not offer what cannot work. */
  available: z.object({ sms: z.boolean(), push: z.boolean() }),
})
export type Preferences = z.infer<typeof PreferencesSchema>

/** Changing the sign-in address needs the current password: a session left open must not be enough to take the account. */
export const PreferencesInputSchema = z
  .object({
    email: text().trim().toLowerCase().email('Enter a valid e-mail address').max(200).optional(),
    currentPassword: text().max(200).optional(),
    phone: PhoneSchema.nullable().optional(),
    channels: z.array(ChannelSchema).min(1, 'Accept at least one channel').optional(),
    quietStart: hhmm.nullable().optional(),
    quietEnd: hhmm.nullable().optional(),
  })
  .refine((p) => (p.quietStart === undefined) === (p.quietEnd === undefined) && (p.quietStart === null) === (p.quietEnd === null), {
    path: ['quietEnd'],
    message: 'Give both the start and the end of quiet hours, or neither',
  })
  .refine((p) => !p.channels?.includes('sms') || p.phone !== null, { path: ['phone'], message: 'Texts need a mobile number' })
export type PreferencesInput = z.infer<typeof PreferencesInputSchema>

const base64url = text().regex(/^[A-Za-z0-9_-]+=*$/, 'Not base64url')
/** A browser's push subscription as `PushSubscription.toJSON()` gives it (RFC 8030 endpoint, RFC 8291 keys). */
export const PushSubscriptionInputSchema = z.object({
  endpoint: text()
    .url()
    .max(1000)
    .refine((u) => /^https?:\/\//.test(u), 'The endpoint must be an http(s) URL'),
  keys: z.object({ p256dh: base64url.max(200), auth: base64url.max(100) }),
})
export type PushSubscriptionInput = z.infer<typeof PushSubscriptionInputSchema>
export const PushUnsubscribeInputSchema = z.object({ endpoint: text().url().max(1000) })
