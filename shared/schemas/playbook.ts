import { z } from 'zod'
import { text } from './text'
import { wallDateTime } from './calendar'
import { AssigneeRuleSchema, CategorySchema, PrioritySchema } from './routine'

const hhmm = text().regex(/^([01]\d|2[0-3]):[0-5]\d$/, 'Use HH:MM, 24-hour')

export const EVENT_KINDS = ['arrival', 'transfer', 'grading', 'weighing', 'sampling', 'harvest', 'dispatch', 'treatment', 'other'] as const
export const EventKindSchema = z.enum(EVENT_KINDS)
export type EventKind = z.infer<typeof EventKindSchema>
/** Handling and dispatch events hold feeding for a fasting window before them. */
export const FASTING_KINDS: readonly EventKind[] = ['transfer', 'grading', 'weighing', 'sampling', 'harvest', 'dispatch']

/**
 * When a playbook step falls, relative to the event: either a day offset and a local time
 * ("−1 day 14:00", "+1 day 08:00"), or minutes from the event's start ("0 h", "+10 min");
 * `repeatDays` makes it daily for that many days ("daily for 30 days").
 */
export const PlaybookStepSchema = z
  .object({
    title: text().trim().min(1, 'Required').max(160),
    category: CategorySchema,
    instructions: text().trim().max(4000).default(''),
    dayOffset: z.number().int().min(-30).max(365).default(0),
    time: hhmm.nullable().default(null),
    minutesOffset: z
      .number()
      .int()
      .min(-7 * 1440)
      .max(7 * 1440)
      .default(0),
    repeatDays: z.number().int().min(1).max(365).default(1),
    perTank: z.boolean().default(true),
    durationMinutes: z.number().int().min(1).max(1440).default(10),
    graceMinutes: z
      .number()
      .int()
      .min(0)
      .max(7 * 1440)
      .default(60),
    priority: PrioritySchema.default('routine'),
    assigneeRule: AssigneeRuleSchema.default({ kind: 'none' }),
    requiredReadings: z.array(text().min(1)).max(30).default([]),
    ladderId: z.number().int().nullable().default(null),
  })
  .refine((s) => s.time === null || s.minutesOffset === 0, {
    path: ['minutesOffset'],
    message: 'Give either a time of day or minutes from the start, not both',
  })
export type PlaybookStep = z.output<typeof PlaybookStepSchema>

export const PlaybookInputSchema = z.object({
  name: text().trim().min(1, 'Required').max(160),
  kind: EventKindSchema,
  description: text().trim().max(4000).default(''),
  fastingHours: z.number().int().min(0).max(168).default(0),
  steps: z.array(PlaybookStepSchema).min(1, 'A playbook needs at least one step').max(60),
})
export type PlaybookInput = z.input<typeof PlaybookInputSchema>
export type ParsedPlaybookInput = z.output<typeof PlaybookInputSchema>
export const PlaybookSchema = z.object({
  id: z.number().int(),
  name: text(),
  kind: EventKindSchema,
  description: text(),
  fastingHours: z.number().int(),
  steps: z.array(PlaybookStepSchema),
})
export type Playbook = z.infer<typeof PlaybookSchema>

export const EVENT_STATUSES = ['planned', 'ended', 'cancelled'] as const
const localDateTime = wallDateTime({ seconds: 'optional' })

export const EventInputSchema = z
  .object({
    playbookId: z.number().int().positive(),
    title: text().trim().min(1, 'Required').max(160),
    localStart: localDateTime,
    tankIds: z.array(z.number().int().positive()).max(200).default([]),
    batchId: z.number().int().positive().nullable().default(null),
    notes: text().trim().max(4000).default(''),
    /** Overrides the playbook's fasting window length for this event. */
    fastingHours: z.number().int().min(0).max(168).nullable().default(null),
  })
  .refine((e) => e.tankIds.length > 0 || e.batchId !== null, { path: ['tankIds'], message: 'Choose the tanks or the batch' })
export type EventInput = z.input<typeof EventInputSchema>
export type ParsedEventInput = z.output<typeof EventInputSchema>

export const EventSchema = z.object({
  id: z.number().int(),
  playbookId: z.number().int(),
  kind: EventKindSchema,
  title: text(),
  localStart: text(),
  startsAt: text(),
  tankIds: z.array(z.number().int()),
  batchId: z.number().int().nullable(),
  notes: text(),
  status: z.enum(EVENT_STATUSES),
  fastingFrom: text().nullable(),
  fastingTo: text().nullable(),
  taskCount: z.number().int(),
})
export type FacilityEvent = z.infer<typeof EventSchema>

export const UpdateEventInputSchema = z.object({
  localStart: localDateTime.optional(),
  tankIds: z.array(z.number().int().positive()).max(200).optional(),
  notes: text().trim().max(4000).optional(),
  fastingHours: z.number().int().min(0).max(168).nullable().optional(),
})
export type UpdateEventInput = z.infer<typeof UpdateEventInputSchema>
