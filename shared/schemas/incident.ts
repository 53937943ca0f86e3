import { z } from 'zod'
// This file's own text(max) trims and caps; every field still starts from the shared textField().
import { text as textField } from './text'

export const INCIDENT_STATUSES = ['proposed', 'dismissed', 'open', 'reported', 'closed'] as const
export const INCIDENT_SOURCES = ['missed_task', 'critical_recheck', 'mortality_threshold', 'manual'] as const
export const IncidentStatusSchema = z.enum(INCIDENT_STATUSES)
export type IncidentStatus = z.infer<typeof IncidentStatusSchema>

const text = (max: number) => textField().trim().max(max)

export const IncidentNoteSchema = z.object({ at: textField(), personId: z.number().int(), personName: textField(), text: textField() })
export const ToldSchema = z.object({ who: text(160).min(1), at: textField().datetime() })

/** One adverse event: what happened, who was told, and the three deadlines from the facility's settings. */
export const IncidentSchema = z.object({
  id: z.number().int(),
  status: IncidentStatusSchema,
  source: z.enum(INCIDENT_SOURCES),
  taskId: z.number().int().nullable(),
  title: textField(),
  whatHappened: textField(),
  startedAt: textField(),
  noticedAt: textField(),
  tankIds: z.array(z.number().int()),
  batchIds: z.array(z.number().int()),
  personIds: z.array(z.number().int()),
  affected: z.number().int(),
  dead: z.number().int(),
  immediateActions: textField(),
  told: z.array(ToldSchema),
  rootCause: textField(),
  correctiveActions: textField(),
  decisionReason: textField().nullable(),
  decidedById: z.number().int().nullable(),
  decidedAt: textField().nullable(),
  /** Names for readers who may not list the staff (observers). */
  decidedByName: textField().nullable(),
  /** Who filed it by hand (null for Roundtide's proposals). */
  filedById: z.number().int().nullable(),
  filedByName: textField().nullable(),
  people: z.array(z.object({ id: z.number().int(), name: textField() })),
  welfareDueAt: textField(),
  committeeDueAt: textField(),
  reportDueAt: textField(),
  /** When the welfare officer was told (the first deadline is met by this). */
  welfareNotifiedAt: textField().nullable(),
  /** When the ethics committee was told (status "reported"); the second deadline. */
  reportedAt: textField().nullable(),
  /** When the full report was filed and the incident closed; the third deadline. */
  closedAt: textField().nullable(),
  /** When each overdue deadline started its one escalation (committee, welfare officer, full report). */
  escalatedAt: textField().nullable(),
  welfareEscalatedAt: textField().nullable(),
  reportEscalatedAt: textField().nullable(),
  notes: z.array(IncidentNoteSchema),
})
export type Incident = z.infer<typeof IncidentSchema>

export const DecideIncidentInputSchema = z.object({ reason: text(500).min(3, 'Say why in a few words') })
export const IncidentNoteInputSchema = z.object({ text: text(2000).min(1, 'Write the note') })
export type DecideIncidentInput = z.infer<typeof DecideIncidentInputSchema>
export type IncidentNoteInput = z.infer<typeof IncidentNoteInputSchema>

/** The record's fields a supervisor or manager fills in; status moves open → reported → closed only. */
export const UpdateIncidentInputSchema = z
  .object({
    title: text(160).min(1),
    whatHappened: text(4000),
    startedAt: textField().datetime(),
    noticedAt: textField().datetime(),
    tankIds: z.array(z.number().int().positive()).max(200),
    batchIds: z.array(z.number().int().positive()).max(200),
    personIds: z.array(z.number().int().positive()).max(200),
    affected: z.number().int().min(0),
    dead: z.number().int().min(0),
    immediateActions: text(4000),
    told: z.array(ToldSchema).max(50),
    rootCause: text(4000),
    correctiveActions: text(4000),
    /** The welfare officer was told at this time (it may be earlier than the record is filled in). */
    welfareNotifiedAt: textField().datetime(),
    status: z.enum(['reported', 'closed']),
  })
  .partial()
export type UpdateIncidentInput = z.infer<typeof UpdateIncidentInputSchema>

/**
 * An incident a person files by hand (an escape, an injury during handling, a power cut): what
 * Roundtide cannot see. Deadlines run from when it was noticed, as for a proposal.
 */
export const FileIncidentInputSchema = z
  .object({
    title: text(160).min(1, 'Say in a few words what happened'),
    whatHappened: text(4000).min(1, 'Describe what happened'),
    startedAt: textField().datetime({ message: 'When did it start? Your best estimate' }),
    noticedAt: textField().datetime({ message: 'When was it noticed?' }),
    tankIds: z.array(z.number().int().positive()).max(200),
    batchIds: z.array(z.number().int().positive()).max(200),
    affected: z.number({ message: 'A whole number, 0 or more' }).int('A whole number, 0 or more').min(0, 'A whole number, 0 or more'),
    dead: z.number({ message: 'A whole number, 0 or more' }).int('A whole number, 0 or more').min(0, 'A whole number, 0 or more'),
    immediateActions: text(4000),
  })
  .refine((i) => Date.parse(i.startedAt) <= Date.parse(i.noticedAt), { path: ['noticedAt'], message: 'It cannot be noticed before it started' })
  .refine((i) => i.dead <= i.affected, { path: ['dead'], message: 'The dead are counted among the affected' })
export type FileIncidentInput = z.infer<typeof FileIncidentInputSchema>
