import { z } from 'zod'

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

/** How a message reaches a person: e-mail, a text message (SMS) or a push notification to the installed app. */
export const CHANNELS = ['email', 'sms', 'push'] as const
export const ChannelSchema = z.enum(CHANNELS)
export type Channel = z.infer<typeof ChannelSchema>

export const LadderStepSchema = z.object({
  afterMinutes: z.number().int().min(0).max(7 * 24 * 60),
  notify: z.array(RecipientSchema).min(1, 'Notify someone'),
  /** Unset (ladders saved before channels existed) reads as e-mail only. */
  channels: z.array(ChannelSchema).min(1, 'Choose at least one channel').optional(),
})
export type LadderStep = z.infer<typeof LadderStepSchema>
export const stepChannels = (step: LadderStep): Channel[] => step.channels ?? ['email']

export const LadderInputSchema = z.object({
  name: z.string().trim().min(1, 'Required').max(120),
  steps: z
    .array(LadderStepSchema)
    .min(1, 'A ladder needs at least one step')
    .max(10)
    .refine((steps) => steps.every((s, i) => i === 0 || s.afterMinutes > steps[i - 1].afterMinutes), 'Each step must come later than the one before'),
})
export type LadderInput = z.infer<typeof LadderInputSchema>
export const LadderSchema = LadderInputSchema.extend({ id: z.number().int() })
export type Ladder = z.infer<typeof LadderSchema>

/**
 * `failed` is retried with back-off; `undelivered` is final (the provider refused or could not
 * deliver it, and the next channel was queued); `suppressed` was held back by the text limit.
 */
export const NOTIFICATION_STATUSES = ['pending', 'sending', 'sent', 'failed', 'held', 'superseded', 'undelivered', 'suppressed'] as const

export const EscalationRecordSchema = z.object({
  alertId: z.number().int(),
  kind: z.string(),
  detail: z.string(),
  startedAt: z.string(),
  acknowledgedAt: z.string().nullable(),
  acknowledgedByName: z.string().nullable(),
  closedAt: z.string().nullable(),
  ladderName: z.string().nullable(),
  notifications: z.array(
    z.object({
      step: z.number().int(),
      channel: ChannelSchema,
      personName: z.string(),
      email: z.string(),
      /** The phone number or push service the message went to; the e-mail address for mail. */
      destination: z.string(),
      providerId: z.string().nullable(),
      /** The provider's own word on delivery, from its status callbacks (e.g. delivered, undelivered). */
      providerStatus: z.string().nullable(),
      status: z.enum(NOTIFICATION_STATUSES),
      attempts: z.number().int(),
      sentAt: z.string().nullable(),
      lastError: z.string().nullable(),
    }),
  ),
})
export type EscalationRecord = z.infer<typeof EscalationRecordSchema>

export const OutboxMessageSchema = z.object({
  id: z.number().int(),
  to: z.string(),
  subject: z.string(),
  text: z.string(),
  html: z.string(),
  receivedAt: z.string(),
})
export type OutboxMessage = z.infer<typeof OutboxMessageSchema>

/** What the local text provider received (local mode), shown on the Outbox page beside the e-mail. */
export const TextOutboxMessageSchema = z.object({
  id: z.number().int(),
  sid: z.string(),
  direction: z.enum(['outbound', 'inbound']),
  to: z.string(),
  from: z.string(),
  body: z.string(),
  status: z.string(),
  receivedAt: z.string(),
})
export type TextOutboxMessage = z.infer<typeof TextOutboxMessageSchema>

export const TextReplyInputSchema = z.object({ body: z.string().trim().min(1, 'Type a reply').max(160) })
