import { DateTime } from 'luxon'
import { z } from 'zod'
import { text } from '#shared/schemas/text'
import type { EventInput } from '#shared/schemas/playbook'

export type EventFormValues = {
  playbookId: string
  title: string
  localStart: string
  target: 'tanks' | 'batch'
  tankIds: number[]
  batchId: string
  notes: string
  fastingHours: string
}

export const LOCAL_START = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}$/

export const eventFormSchema = z
  .object({
    playbookId: text().min(1, 'Choose a playbook'),
    title: text().trim().min(1, 'Required').max(160),
    localStart: text().regex(LOCAL_START, 'Give a date and a time'),
    target: z.enum(['tanks', 'batch']),
    tankIds: z.array(z.number().int()),
    batchId: text(),
    notes: text().trim().max(4000),
    fastingHours: text()
      .trim()
      .regex(/^(\d{1,3})?$/, 'Whole hours, 0 to 168'),
  })
  .superRefine((v, ctx) => {
    if (v.target === 'tanks' && v.tankIds.length === 0) ctx.addIssue({ code: 'custom', path: ['tankIds'], message: 'Choose at least one tank' })
    if (v.target === 'batch' && !v.batchId) ctx.addIssue({ code: 'custom', path: ['batchId'], message: 'Choose a batch' })
    if (v.fastingHours && Number(v.fastingHours) > 168) ctx.addIssue({ code: 'custom', path: ['fastingHours'], message: 'At most 168 hours (7 days)' })
  })
  .transform((v): EventInput => ({
    playbookId: Number(v.playbookId),
    title: v.title,
    localStart: v.localStart,
    tankIds: v.target === 'tanks' ? v.tankIds : [],
    batchId: v.target === 'batch' ? Number(v.batchId) : null,
    notes: v.notes,
    fastingHours: v.fastingHours === '' ? null : Number(v.fastingHours),
  }))

/** Tomorrow at 09:00 on the facility's clock. */
export const defaultEventValues = (zone: string): EventFormValues => ({
  playbookId: '',
  title: '',
  localStart: DateTime.now().setZone(zone).plus({ days: 1 }).toFormat("yyyy-MM-dd'T'09:00"),
  target: 'tanks',
  tankIds: [],
  batchId: '',
  notes: '',
  fastingHours: '',
})

/** The fasting window an event would get, as instants, or null when it holds no feeds. */
export function fastingWindowFor(localStart: string, zone: string, hours: number) {
  const start = DateTime.fromISO(localStart, { zone })
  if (!start.isValid || hours <= 0) return null
  return { from: start.minus({ hours }).toISO()!, to: start.toISO()! }
}
