import { z } from 'zod'
import { text } from './text'

/** Whom a ladder step notifies; `person` names someone such as the welfare officer. */
export const RecipientSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('assignee') }),
  z.object({ kind: z.literal('on_shift') }),
  z.object({ kind: z.literal('on_call') }),
  z.object({ kind: z.literal('supervisors') }),
  z.object({ kind: z.literal('managers') }),
  z.object({ kind: z.literal('person'), personId: z.number().int().positive() }),
])
export type Recipient = z.infer<typeof RecipientSchema>

export const LadderStepSchema = z.object({
  afterMinutes: z.number().int().min(0).max(7 * 24 * 60),
  notify: z.array(RecipientSchema).min(1, 'Notify someone'),
})
export type LadderStep = z.infer<typeof LadderStepSchema>

export const LadderInputSchema = z.object({
  name: text().trim().min(1, 'Required').max(120),
  steps: z
    .array(LadderStepSchema)
    .min(1, 'A ladder needs at least one step')
    .max(10)
    .refine((steps) => steps.every((s, i) => i === 0 || s.afterMinutes > steps[i - 1].afterMinutes), 'Each step must come later than the one before'),
})
export type LadderInput = z.infer<typeof LadderInputSchema>
export const LadderSchema = LadderInputSchema.extend({ id: z.number().int() })
export type Ladder = z.infer<typeof LadderSchema>

export const NOTIFICATION_STATUSES = ['pending', 'sending', 'sent', 'failed', 'held', 'superseded'] as const

export const EscalationRecordSchema = z.object({
  alertId: z.number().int(),
  kind: text(),
  detail: text(),
  startedAt: text(),
  acknowledgedAt: text().nullable(),
  acknowledgedByName: text().nullable(),
  closedAt: text().nullable(),
  ladderName: text().nullable(),
  notifications: z.array(
    z.object({
      step: z.number().int(),
      personName: text(),
      email: text(),
      status: z.enum(NOTIFICATION_STATUSES),
      attempts: z.number().int(),
      sentAt: text().nullable(),
      lastError: text().nullable(),
    }),
  ),
})
export type EscalationRecord = z.infer<typeof EscalationRecordSchema>

export const OutboxMessageSchema = z.object({
  id: z.number().int(),
  to: text(),
  subject: text(),
  text: text(),
  html: text(),
  receivedAt: text(),
})
export type OutboxMessage = z.infer<typeof OutboxMessageSchema>
