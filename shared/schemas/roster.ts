import { z } from 'zod'
import { text } from './text'
import { calendarDate } from './calendar'

const isoDate = calendarDate()
const hhmm = text().regex(/^([01]\d|2[0-3]):[0-5]\d$/, 'Use HH:MM, 24-hour')

export const SHIFT_KINDS = ['day', 'early', 'late', 'weekend'] as const
export const ShiftKindSchema = z.enum(SHIFT_KINDS)

export const ShiftSchema = z.object({
  id: z.number().int(),
  personId: z.number().int(),
  personName: text(),
  date: isoDate,
  start: hhmm,
  end: hhmm,
  kind: ShiftKindSchema,
})
export type Shift = z.infer<typeof ShiftSchema>

const ShiftFieldsSchema = z.object({ personId: z.number().int().positive(), date: isoDate, start: hhmm, end: hhmm, kind: ShiftKindSchema })
export const ShiftInputSchema = ShiftFieldsSchema.refine((s) => s.start !== s.end, { path: ['end'], message: 'A shift needs some length' })
export type ShiftInput = z.infer<typeof ShiftInputSchema>
/** A change to a shift: any of its fields; the server checks the shift they make with the rest. */
export const ShiftPatchSchema = ShiftFieldsSchema.partial()
export type ShiftPatch = z.infer<typeof ShiftPatchSchema>

export const WEEKDAYS = ['MO', 'TU', 'WE', 'TH', 'FR', 'SA', 'SU'] as const
export const ShiftPatternInputSchema = z
  .object({
    personId: z.number().int().positive(),
    weekdays: z.array(z.enum(WEEKDAYS)).min(1, 'Choose at least one day'),
    start: hhmm,
    end: hhmm,
    kind: ShiftKindSchema,
    from: isoDate,
    to: isoDate,
  })
  .superRefine((p, ctx) => {
    if (p.to < p.from) ctx.addIssue({ code: 'custom', path: ['to'], message: 'Ends before it starts' })
    if ((Date.parse(p.to) - Date.parse(p.from)) / 86_400_000 > 366) ctx.addIssue({ code: 'custom', path: ['to'], message: 'At most a year at a time' })
  })
export type ShiftPatternInput = z.infer<typeof ShiftPatternInputSchema>

export const OnCallDutySchema = z.object({
  id: z.number().int(),
  personId: z.number().int(),
  personName: text(),
  fromDate: isoDate,
  toDate: isoDate,
  startsAt: text(),
  endsAt: text(),
})
export type OnCallDuty = z.infer<typeof OnCallDutySchema>

/** Duty runs from the handover time on fromDate to the handover time on toDate. */
export const OnCallInputSchema = z
  .object({ personId: z.number().int().positive(), fromDate: isoDate, toDate: isoDate })
  .refine((d) => d.toDate > d.fromDate, { path: ['toDate'], message: 'Duty must end after it starts' })
export type OnCallInput = z.infer<typeof OnCallInputSchema>

export const RotationInputSchema = z.object({
  personIds: z.array(z.number().int().positive()).min(1, 'Choose who shares the duty'),
  from: isoDate,
  weeks: z.number().int().min(1).max(52),
})
export type RotationInput = z.infer<typeof RotationInputSchema>

export const RotationResultSchema = z.object({
  duties: z.array(OnCallDutySchema),
  weekendCounts: z.array(z.object({ personId: z.number().int(), personName: text(), weekends: z.number().int() })),
})
export type RotationResult = z.infer<typeof RotationResultSchema>

export const COVERAGE_KINDS = ['tasks_without_shift', 'no_one_on_call', 'double_booked', 'welfare_task_off_shift'] as const
export const CoverageWarningSchema = z.object({
  kind: z.enum(COVERAGE_KINDS),
  date: isoDate,
  message: text(),
  personId: z.number().int().nullable(),
  taskId: z.number().int().nullable(),
})
export type CoverageWarning = z.infer<typeof CoverageWarningSchema>

export const RosterRangeQuerySchema = z
  .object({ from: isoDate, to: isoDate })
  .refine((q) => q.to >= q.from, { path: ['to'], message: 'Ends before it starts' })
  .refine((q) => (Date.parse(q.to) - Date.parse(q.from)) / 86_400_000 <= 93, { path: ['to'], message: 'Ask for at most 93 days at a time' })

export const HandoverNoteInputSchema = z.object({ text: text().trim().min(1, 'Write something').max(4000) })
export type HandoverNoteInput = z.infer<typeof HandoverNoteInputSchema>
export const HandoverNoteSchema = z.object({ id: z.number().int(), personId: z.number().int(), personName: text(), text: text(), createdAt: text() })
export type HandoverNote = z.infer<typeof HandoverNoteSchema>
