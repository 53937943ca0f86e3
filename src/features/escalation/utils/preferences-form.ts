import { z } from 'zod'
import { ChannelSchema } from '#shared/schemas/ladder'
import { PhoneSchema, type Preferences, type PreferencesInput } from '#shared/schemas/preferences'

const time = z.union([z.literal(''), z.string().regex(/^([01]\d|2[0-3]):[0-5]\d$/, 'Use HH:MM, 24-hour')])

// The shared PreferencesInputSchema with '' for "no quiet hours" and "no mobile number".
export const PreferencesFormSchema = z
  .object({
    email: z.string().trim().toLowerCase().email('Enter a valid e-mail address').max(200),
    phone: z.union([z.literal(''), PhoneSchema]),
    channels: z.array(ChannelSchema).min(1, 'Accept at least one channel'),
    quietStart: time,
    quietEnd: time,
  })
  .refine((p) => (p.quietStart === '') === (p.quietEnd === ''), { path: ['quietEnd'], message: 'Give both the start and the end of quiet hours, or neither' })
  .refine((p) => !p.channels.includes('sms') || p.phone !== '', { path: ['phone'], message: 'Texts need a mobile number' })
export type PreferencesFormValues = z.infer<typeof PreferencesFormSchema>

export const toFormValues = (p: Preferences): PreferencesFormValues => ({ email: p.email, phone: p.phone ?? '', channels: p.channels, quietStart: p.quietStart ?? '', quietEnd: p.quietEnd ?? '' })
export const toPreferences = (v: PreferencesFormValues): PreferencesInput => ({
  email: v.email,
  phone: v.phone || null,
  channels: v.channels,
  quietStart: v.quietStart || null,
  quietEnd: v.quietEnd || null,
})
