import { z } from 'zod'
import { text } from './text'
import { calendarDate, wallDateTime } from './calendar'
import { RoleSchema } from './person'

export const ROUTINE_CATEGORIES = [
  'welfare',
  'feeding',
  'water_quality',
  'life_support',
  'quarantine',
  'maintenance',
  'hygiene',
  'calibration',
  'alarms',
  'stores',
  'stock',
  'veterinary',
  'records',
  'research',
  'on_call',
] as const
export const CategorySchema = z.enum(ROUTINE_CATEGORIES)
export type Category = z.infer<typeof CategorySchema>

export const CATEGORY_LABELS: Record<Category, string> = {
  welfare: 'Welfare check',
  feeding: 'Feeding',
  water_quality: 'Water quality',
  life_support: 'Life support',
  quarantine: 'Quarantine',
  maintenance: 'Maintenance',
  hygiene: 'Hygiene',
  calibration: 'Calibration',
  alarms: 'Alarm test',
  stores: 'Stores',
  stock: 'Stock',
  veterinary: 'Veterinary',
  records: 'Records',
  research: 'Research',
  on_call: 'On call',
}

/** What a routine or task is about; `area_tanks` means every tank in the named areas. */
export const TARGET_KINDS = ['facility', 'area', 'system', 'tank', 'equipment', 'batch', 'area_tanks'] as const
export const TargetKindSchema = z.enum(TARGET_KINDS)
export type TargetKind = z.infer<typeof TargetKindSchema>

export const PRIORITIES = ['routine', 'welfare_critical'] as const
export const PrioritySchema = z.enum(PRIORITIES)

export const AssigneeRuleSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('none') }),
  z.object({ kind: z.literal('person'), personId: z.number().int().positive() }),
  z.object({ kind: z.literal('role_on_shift'), role: RoleSchema }),
  z.object({ kind: z.literal('on_call') }),
])
export type AssigneeRule = z.infer<typeof AssigneeRuleSchema>

const localDateTime = wallDateTime({ seconds: 'required' })
const isoDate = calendarDate()

export const RoutineSchema = z.object({
  id: z.number().int(),
  name: text(),
  category: CategorySchema,
  instructions: text(),
  targetKind: TargetKindSchema,
  targetIds: z.array(z.number().int()),
  onlyInUse: z.boolean(),
  rrule: text(),
  dtstart: localDateTime,
  durationMinutes: z.number().int(),
  windowBeforeMinutes: z.number().int(),
  graceMinutes: z.number().int(),
  priority: PrioritySchema,
  assigneeRule: AssigneeRuleSchema,
  requiredReadings: z.array(text()),
  activeFrom: isoDate.nullable(),
  activeTo: isoDate.nullable(),
  paused: z.boolean(),
  skipDates: z.array(isoDate),
  ladderId: z.number().int().nullable(),
  /** Why the last planning run could not make tasks from this routine; null when it could. */
  planningError: text().nullable(),
  version: z.number().int(),
})
export type Routine = z.infer<typeof RoutineSchema>

export const RoutineInputSchema = z
  .object({
    name: text().trim().min(1, 'Required').max(160),
    category: CategorySchema,
    instructions: text().trim().max(4000).default(''),
    targetKind: TargetKindSchema,
    targetIds: z.array(z.number().int().positive()).max(500).default([]),
    onlyInUse: z.boolean().default(true),
    rrule: text().trim().min(1, 'Required').max(500),
    dtstart: localDateTime,
    durationMinutes: z
      .number()
      .int()
      .min(1, 'At least 1 minute')
      .max(24 * 60)
      .default(5),
    windowBeforeMinutes: z
      .number()
      .int()
      .min(0)
      .max(24 * 60)
      .default(30),
    graceMinutes: z
      .number()
      .int()
      .min(0)
      .max(7 * 24 * 60)
      .default(60),
    priority: PrioritySchema.default('routine'),
    assigneeRule: AssigneeRuleSchema.default({ kind: 'none' }),
    requiredReadings: z.array(text().min(1)).max(30).default([]),
    activeFrom: isoDate.nullable().default(null),
    activeTo: isoDate.nullable().default(null),
    paused: z.boolean().default(false),
    skipDates: z.array(isoDate).max(400).default([]),
    ladderId: z.number().int().nullable().default(null),
  })
  .superRefine((r, ctx) => {
    if (r.targetKind !== 'facility' && r.targetIds.length === 0) {
      ctx.addIssue({ code: 'custom', path: ['targetIds'], message: 'Choose at least one target' })
    }
    if (r.activeFrom && r.activeTo && r.activeTo < r.activeFrom) {
      ctx.addIssue({ code: 'custom', path: ['activeTo'], message: 'Ends before it starts' })
    }
  })
export type RoutineInput = z.input<typeof RoutineInputSchema>
export type RoutineData = z.output<typeof RoutineInputSchema>
export const UpdateRoutineInputSchema = z.object({ version: z.number().int() }).and(RoutineInputSchema)
export type UpdateRoutineInput = z.input<typeof UpdateRoutineInputSchema>
export type ParsedUpdateRoutineInput = z.output<typeof UpdateRoutineInputSchema>
