import { z } from 'zod'
import type { Preferences } from '../api/escalation-queries'

const time = z.union([z.literal(''), z.string().regex(/^([01]\d|2[0-3]):[0-5]\d$/, 'Use HH:MM, 24-hour')])

// Mirrors the server's PreferencesInputSchema (server/modules/escalation/escalation.routes.ts), with '' for "no quiet hours".
export const PreferencesFormSchema = z
  .object({ email: z.string().trim().toLowerCase().email('Enter a valid e-mail address').max(200), quietStart: time, quietEnd: time })
  .refine((p) => (p.quietStart === '') === (p.quietEnd === ''), { path: ['quietEnd'], message: 'Give both the start and the end of quiet hours, or neither' })
export type PreferencesFormValues = z.infer<typeof PreferencesFormSchema>

export const toFormValues = (p: Preferences): PreferencesFormValues => ({ email: p.email, quietStart: p.quietStart ?? '', quietEnd: p.quietEnd ?? '' })
export const toPreferences = (v: PreferencesFormValues): Preferences => ({ email: v.email, quietStart: v.quietStart || null, quietEnd: v.quietEnd || null })
