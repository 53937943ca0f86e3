import { z } from 'zod'
import { text } from '#shared/schemas/text'
import type { Preferences, PreferencesInput } from '#shared/schemas/person'

const time = z.union([z.literal(''), text().regex(/^([01]\d|2[0-3]):[0-5]\d$/, 'Use HH:MM, 24-hour')])

/**
 * The server's PreferencesInputSchema (shared/schemas/person.ts) as a form: '' for "no quiet
 * hours", and the current password asked for only when the address differs from the saved one.
 */
export const preferencesFormSchema = (savedEmail: string) =>
  z
    .object({ email: text().trim().toLowerCase().email('Enter a valid e-mail address').max(200), currentPassword: text().max(200), quietStart: time, quietEnd: time })
    .refine((p) => (p.quietStart === '') === (p.quietEnd === ''), { path: ['quietEnd'], message: 'Give both the start and the end of quiet hours, or neither' })
    .refine((p) => p.email === savedEmail || p.currentPassword !== '', { path: ['currentPassword'], message: 'Enter your current password to change your e-mail' })
export type PreferencesFormValues = z.infer<ReturnType<typeof preferencesFormSchema>>

export const toFormValues = (p: Preferences): PreferencesFormValues => ({ email: p.email, currentPassword: '', quietStart: p.quietStart ?? '', quietEnd: p.quietEnd ?? '' })

export const toPreferencesInput = (v: PreferencesFormValues, savedEmail: string): PreferencesInput => ({
  email: v.email,
  ...(v.email !== savedEmail ? { currentPassword: v.currentPassword } : {}),
  quietStart: v.quietStart || null,
  quietEnd: v.quietEnd || null,
})
