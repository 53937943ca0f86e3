import { z } from 'zod'
import { text } from './text'
import { BandSchema } from './parameter'
import { RoundMortalityDetailSchema } from './stock'
import { TaskSchema } from './task'

export const SKIP_REASONS = ['no_access', 'tank_empty', 'equipment_fault', 'fish_stressed', 'not_enough_time', 'other'] as const
export const SKIP_REASON_LABELS: Record<(typeof SKIP_REASONS)[number], string> = {
  no_access: 'Could not get to it',
  tank_empty: 'Tank is empty',
  equipment_fault: 'Meter or equipment not working',
  fish_stressed: 'Fish too stressed to disturb',
  not_enough_time: 'Ran out of time',
  other: 'Other (say why)',
}

export const CompletionInputSchema = z
  .object({
    /** Made by the client, so a replay (e.g. after a dropped connection) is recognised. */
    completionId: text().uuid('completionId must be a UUID'),
    outcome: z.enum(['done', 'skipped']).default('done'),
    version: z.number().int().optional(),
    readings: z.record(text().min(1).max(40), z.number({ error: 'Enter a number' }).finite('Enter a number')).default({}),
    skipReason: z.enum(SKIP_REASONS).optional(),
    note: text().trim().max(2000).optional(),
    /** When the work was really done (typing in a paper sheet later); defaults to now. */
    doneAt: text().datetime().optional(),
    /** Typing in a paper round sheet: who really did it (supervisors and managers only). */
    performedById: z.number().int().positive().optional(),
    /** What is known about the fish counted in the mortalities reading. */
    mortality: RoundMortalityDetailSchema.optional(),
  })
  .superRefine((c, ctx) => {
    if (c.outcome === 'skipped' && !c.skipReason) ctx.addIssue({ code: 'custom', path: ['skipReason'], message: 'Choose why it could not be done' })
    if (c.outcome === 'skipped' && c.skipReason === 'other' && !c.note)
      ctx.addIssue({ code: 'custom', path: ['note'], message: 'Say why it could not be done' })
  })
export type CompletionInput = z.input<typeof CompletionInputSchema>
/** What the server's completion takes, once the route has parsed the body. */
export type ParsedCompletionInput = z.output<typeof CompletionInputSchema>

export const ReadingSchema = z.object({
  parameterKey: text(),
  value: z.number(),
  unit: text(),
  band: BandSchema,
  derived: z.boolean(),
})
export type Reading = z.infer<typeof ReadingSchema>

export const CompletionResultSchema = z.object({
  task: TaskSchema,
  readings: z.array(ReadingSchema),
  recheckTaskId: z.number().int().nullable(),
  notes: z.array(text()),
})
export type CompletionResult = z.infer<typeof CompletionResultSchema>

export const AmendmentInputSchema = z.object({
  reason: text().trim().min(5, 'Say why the record is corrected').max(1000),
  readings: z.record(text().min(1).max(40), z.number({ error: 'Enter a number' }).finite()).default({}),
  note: text().trim().max(2000).optional(),
})
export type AmendmentInput = z.input<typeof AmendmentInputSchema>
export type ParsedAmendmentInput = z.output<typeof AmendmentInputSchema>
