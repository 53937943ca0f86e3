import { z } from 'zod'
import { ChannelSchema } from '#shared/schemas/ladder'
import { PhoneSchema, type Preferences, type PreferencesInput } from '#shared/schemas/preferences'
import { text } from '#shared/schemas/text'

const time = z.union([z.literal(''), text().regex(/^([01]\d|2[0-3]):[0-5]\d$/, 'Use HH:MM, 24-hour')])

/**
 * The server's PreferencesInputSchema (shared/schemas/preferences.ts) as a form: '' for "no quiet
 * hours" and "no mobile number", and the current password asked for only when the address differs
 * from the saved one.
 */
export const preferencesFormSchema = (savedEmail: string) =>
  z
    .object({
      email: text().trim().toLowerCase().email('Enter a valid e-mail address').max(200),
      currentPassword: text().max(200),
      phone: z.union([z.literal(''), PhoneSchema]),
      channels: z.array(ChannelSchema).min(1, 'Accept at least one channel'),
      quietStart: time,
      quietEnd: time,
    })
    .refine((p) => (p.quietStart === '') === (p.quietEnd === ''), { path: ['quietEnd'], message: 'Give both the start and the end of quiet hours, or neither' })
    .refine((p) => !p.channels.includes('sms') || p.phone !== '', { path: ['phone'], message: 'Texts need a mobile number' })
    .refine((p) => p.email === savedEmail || p.currentPassword !== '', {
      path: ['currentPassword'],
      message: 'Enter your current password to change your e-mail',
    })
export type PreferencesFormValues = z.infer<ReturnType<typeof preferencesFormSchema>>

export const toFormValues = (p: Preferences): PreferencesFormValues => ({
  email: p.email,
  currentPassword: '',
  phone: p.phone ?? '',
  channels: p.channels,
  quietStart: p.quietStart ?? '',
  quietEnd: p.quietEnd ?? '',
})

export const toPreferencesInput = (v: PreferencesFormValues, savedEmail: string): PreferencesInput => ({
  email: v.email,
  ...(v.email !== savedEmail ? { currentPassword: v.currentPassword } : {}),
  phone: v.phone || null,
  channels: v.channels,
  quietStart: v.quietStart || null,
  quietEnd: v.quietEnd || null,
})
