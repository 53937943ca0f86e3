import { z } from 'zod'
import { text } from './text'
import { calendarDate, wallDateTime } from './calendar'
import { BandSchema } from './parameter'
import { CategorySchema, PrioritySchema, TargetKindSchema } from './routine'

export const TASK_STATUSES = ['planned', 'open', 'overdue', 'missed', 'done', 'skipped', 'held'] as const
export const TaskStatusSchema = z.enum(TASK_STATUSES)
export type TaskStatus = z.infer<typeof TaskStatusSchema>
export const FINISHED_STATUSES: readonly TaskStatus[] = ['done', 'skipped']

const isoDate = calendarDate()

export const TaskSchema = z.object({
  id: z.number().int(),
  routineId: z.number().int().nullable(),
  /** The playbook event that made it, if any. */
  eventId: z.number().int().nullable().optional(),
  title: text(),
  category: CategorySchema,
  instructions: text(),
  priority: PrioritySchema,
  targetKind: TargetKindSchema,
  targetId: z.number().int().nullable(),
  targetLabel: text(),
  tankId: z.number().int().nullable(),
  areaId: z.number().int().nullable(),
  localDate: isoDate,
  localTime: text(),
  dueAt: text(),
  windowStartAt: text(),
  graceUntil: text(),
  durationMinutes: z.number().int(),
  status: TaskStatusSchema,
  assigneeId: z.number().int().nullable(),
  assigneeName: text().nullable(),
  requiredReadings: z.array(text()),
  flag: BandSchema.nullable(),
  lateMinutes: z.number().int().nullable(),
  completedAt: text().nullable(),
  completedById: z.number().int().nullable(),
  completedByName: text().nullable(),
  heldReason: text().nullable(),
  recheckOfTaskId: z.number().int().nullable(),
  version: z.number().int(),
})
export type Task = z.infer<typeof TaskSchema>

export const TaskListQuerySchema = z
  .object({
    date: isoDate.optional(),
    from: isoDate.optional(),
    to: isoDate.optional(),
    areaId: z.coerce.number().int().positive().optional(),
    category: CategorySchema.optional(),
    assigneeId: z.union([z.coerce.number().int().positive(), z.literal('none')]).optional(),
    status: TaskStatusSchema.optional(),
    routineId: z.coerce.number().int().positive().optional(),
    eventId: z.coerce.number().int().positive().optional(),
    tankId: z.coerce.number().int().positive().optional(),
  })
  .superRefine((q, ctx) => {
    if (!q.date && !(q.from && q.to)) ctx.addIssue({ code: 'custom', path: ['date'], message: 'Give a date, or from and to' })
    if (q.from && q.to) {
      if (q.to < q.from) ctx.addIssue({ code: 'custom', path: ['to'], message: 'Ends before it starts' })
      const days = (Date.parse(q.to) - Date.parse(q.from)) / 86_400_000
      if (days > 62) ctx.addIssue({ code: 'custom', path: ['to'], message: 'Ask for at most 62 days at a time' })
    }
  })
export type TaskListQuery = z.infer<typeof TaskListQuerySchema>

export const CreateTaskInputSchema = z.object({
  title: text().trim().min(1, 'Required').max(160),
  category: CategorySchema,
  instructions: text().trim().max(4000).default(''),
  priority: PrioritySchema.default('routine'),
  targetKind: TargetKindSchema.exclude(['area_tanks']),
  targetId: z.number().int().positive().nullable().default(null),
  localStart: wallDateTime({ seconds: 'optional' }),
  durationMinutes: z
    .number()
    .int()
    .min(1)
    .max(24 * 60)
    .default(10),
  graceMinutes: z
    .number()
    .int()
    .min(0)
    .max(7 * 24 * 60)
    .default(60),
  assigneeId: z.number().int().positive().nullable().default(null),
  requiredReadings: z.array(text().min(1)).max(30).default([]),
})
export type CreateTaskInput = z.input<typeof CreateTaskInputSchema>
export type ParsedCreateTaskInput = z.output<typeof CreateTaskInputSchema>

export const MoveTaskInputSchema = z
  .object({
    version: z.number().int(),
    assigneeId: z.number().int().positive().nullable().optional(),
    date: isoDate.optional(),
  })
  .refine((m) => m.assigneeId !== undefined || m.date !== undefined, { message: 'Say who to assign or which day to move to' })
export type MoveTaskInput = z.infer<typeof MoveTaskInputSchema>

export const BulkMoveInputSchema = z
  .object({
    tasks: z
      .array(z.object({ id: z.number().int().positive(), version: z.number().int() }))
      .min(1)
      .max(200),
    assigneeId: z.number().int().positive().nullable().optional(),
    date: isoDate.optional(),
  })
  .refine((m) => m.assigneeId !== undefined || m.date !== undefined, { message: 'Say who to assign or which day to move to' })
export type BulkMoveInput = z.infer<typeof BulkMoveInputSchema>
