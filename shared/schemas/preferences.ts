import { z } from 'zod'
import { ChannelSchema } from './ladder'

const hhmm = z.string().regex(/^([01]\d|2[0-3]):[0-5]\d$/, 'Use HH:MM, 24-hour')
/** E.164: a plus, the country code and the number, digits only (what text providers take). */
export const PhoneSchema = z.string().trim().regex(/^\+[1-9]\d{6,14}$/, 'Use the international form, e.g. +447700900123')

/** How escalations reach me: my addresses, the channels I accept and my quiet hours. */
export const PreferencesSchema = z.object({
  email: z.string(),
  phone: z.string().nullable(),
  channels: z.array(ChannelSchema),
  quietStart: z.string().nullable(),
  quietEnd: z.string().nullable(),
  /** Whether this server can send texts / push at all, so the page does not offer what cannot work. */
  available: z.object({ sms: z.boolean(), push: z.boolean() }),
})
export type Preferences = z.infer<typeof PreferencesSchema>

export const PreferencesInputSchema = z
  .object({
    email: z.string().trim().toLowerCase().email('Enter a valid e-mail address').max(200).optional(),
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
