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

/** How a message reaches a person: e-mail, a text message (SMS) or a push notification to the installed app. */
export const CHANNELS = ['email', 'sms', 'push'] as const
export const ChannelSchema = z.enum(CHANNELS)
export type Channel = z.infer<typeof ChannelSchema>

export const LadderStepSchema = z.object({
  afterMinutes: z
    .number()
    .int()
    .min(0)
    .max(7 * 24 * 60),
  notify: z.array(RecipientSchema).min(1, 'Notify someone'),
  /** Unset (ladders saved before channels existed) reads as e-mail only. */
  channels: z.array(ChannelSchema).min(1, 'Choose at least one channel').optional(),
})
export type LadderStep = z.infer<typeof LadderStepSchema>
export const stepChannels = (step: LadderStep): Channel[] => step.channels ?? ['email']

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

/**
 * `failed` is retried with back-off; `undelivered` is final (the provider refused or could not
 * deliver it, and the next channel was queued); `suppressed` was held back by the text limit;
 * `unknown` was claimed by a process that stopped before the provider answered (never resent).
 */
export const NOTIFICATION_STATUSES = ['pending', 'sending', 'sent', 'failed', 'held', 'superseded', 'undelivered', 'suppressed', 'unknown'] as const

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
      channel: ChannelSchema,
      personName: text(),
      email: text(),
      /** The phone number or push service the message went to; the e-mail address for mail. */
      destination: text(),
      providerId: text().nullable(),
      /** The provider's own word on delivery, from its status callbacks (e.g. delivered, undelivered). */
      providerStatus: text().nullable(),
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

/** What the local text provider received (local mode), shown on the Outbox page beside the e-mail. */
export const TextOutboxMessageSchema = z.object({
  id: z.number().int(),
  sid: text(),
  direction: z.enum(['outbound', 'inbound']),
  to: text(),
  from: text(),
  body: text(),
  status: text(),
  receivedAt: text(),
})
export type TextOutboxMessage = z.infer<typeof TextOutboxMessageSchema>

export const TextReplyInputSchema = z.object({ body: text().trim().min(1, 'Type a reply').max(160) })

/** A push message as the local push service decrypted it (or refused it), with the person whose device it was. */
export const PushOutboxMessageSchema = z.object({
  id: z.number().int(),
  /** Null when no person has that device any more (unsubscribed or gone). */
  personName: text().nullable(),
  endpoint: text(),
  status: z.enum(['received', 'refused']),
  title: text(),
  body: text(),
  note: text().nullable(),
  urgency: text().nullable(),
  receivedAt: text(),
})
export type PushOutboxMessage = z.infer<typeof PushOutboxMessageSchema>
