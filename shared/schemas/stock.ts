import { z } from 'zod'
// This file's own text(max) trims and caps; every field still starts from the shared textField().
import { text as textField } from './text'

/** Every kind of change to a batch's numbers; the register is only ever added to. */
export const MOVEMENT_KINDS = ['arrival', 'transfer', 'grading', 'mortality', 'cull', 'sampling', 'dispatch', 'correction'] as const
export type MovementKind = (typeof MOVEMENT_KINDS)[number]
export const MOVEMENT_KIND_LABELS: Record<MovementKind, string> = {
  arrival: 'Arrival',
  transfer: 'Transfer',
  grading: 'Grading',
  mortality: 'Mortality',
  cull: 'Cull / euthanasia',
  sampling: 'Sampled for research',
  dispatch: 'Dispatch / release',
  correction: 'Count correction',
}
/** The cause kept when nobody knows why a fish died; "other" asks for the cause in words. */
export const UNKNOWN_CAUSE = 'unknown'
export const OTHER_CAUSE = 'other'
/** The round's reading whose value becomes a mortality movement. */
export const MORTALITY_READING = 'mortalities'
/** What a technician may record; arrivals, gradings, dispatches and corrections are for supervisors and managers. */
export const TECHNICIAN_MOVEMENT_KINDS: readonly MovementKind[] = ['mortality', 'cull', 'sampling', 'transfer']

export const RoundMortalityDetailSchema = z
  .object({
    cause: textField().trim().min(1).max(80).default(UNKNOWN_CAUSE),
    causeText: textField().trim().max(500).optional(),
    necropsy: z.boolean().default(false),
  })
  .superRefine((d, ctx) => {
    if (d.cause === OTHER_CAUSE && !d.causeText) ctx.addIssue({ code: 'custom', path: ['causeText'], message: 'Say what the cause was' })
  })
export type RoundMortalityDetail = z.input<typeof RoundMortalityDetailSchema>

const id = z.number().int().positive()
const count = z.number({ error: 'Enter a number' }).int('Whole fish only').positive('Must be at least 1').max(10_000_000)
const text = (max: number) => textField().trim().max(max)
const base = z.object({
  batchId: id,
  occurredAt: textField().datetime({ offset: true }).optional(),
  note: text(2000).optional(),
})
const fromTank = { fromTankId: id }

export const TransportWaterSchema = z.object({
  tempC: z.number().min(-2).max(45).nullable().default(null),
  pH: z.number().min(0).max(14).nullable().default(null),
  doMgL: z.number().min(0).max(60).nullable().default(null),
})

export const MovementInputSchema = z
  .discriminatedUnion('kind', [
    base.extend({
      kind: z.literal('arrival'),
      toTankId: id,
      count,
      meanWeightG: z.number().positive().max(100_000).optional(),
      origin: text(200).min(1, 'Say where the fish came from'),
      permitRef: text(120).optional(),
      healthCertificateRef: text(120).optional(),
      transportWater: TransportWaterSchema.optional(),
    }),
    base.extend({ kind: z.literal('transfer'), ...fromTank, toTankId: id, count, meanWeightG: z.number().positive().max(100_000).optional() }),
    base.extend({ kind: z.literal('grading'), ...fromTank, toTankId: id, count, meanWeightG: z.number().positive().max(100_000).optional() }),
    base.extend({
      kind: z.literal('mortality'),
      ...fromTank,
      count,
      cause: text(80).min(1).default(UNKNOWN_CAUSE),
      causeText: text(500).optional(),
      necropsy: z.boolean().default(false),
    }),
    base.extend({ kind: z.literal('cull'), ...fromTank, count, reason: text(500).min(1, 'Say why the fish were culled') }),
    base.extend({ kind: z.literal('sampling'), ...fromTank, count, reason: text(500).min(1, 'Say what the fish were sampled for') }),
    base.extend({ kind: z.literal('dispatch'), ...fromTank, count, destination: text(200).min(1, 'Say where the fish went') }),
    base.extend({
      kind: z.literal('correction'),
      tankId: id,
      /** Fish to add (positive) or take off (negative) the register's count. */
      delta: z
        .number({ error: 'Enter a number' })
        .int('Whole fish only')
        .refine((n) => n !== 0, 'A correction changes the count')
        .refine((n) => Math.abs(n) <= 10_000_000, 'Too large'),
      reason: text(500).min(5, 'Say why the count is corrected'),
      correctsId: id.optional(),
    }),
  ])
  .superRefine((m, ctx) => {
    if ((m.kind === 'transfer' || m.kind === 'grading') && m.fromTankId === m.toTankId) {
      ctx.addIssue({ code: 'custom', path: ['toTankId'], message: 'Choose a different tank to move the fish to' })
    }
  })
export type MovementInput = z.input<typeof MovementInputSchema>
export type ParsedMovementInput = z.output<typeof MovementInputSchema>

export const MovementSchema = z.object({
  id: z.number().int(),
  batchId: z.number().int(),
  batchCode: textField(),
  kind: z.enum(MOVEMENT_KINDS),
  occurredAt: textField(),
  fromTankId: z.number().int().nullable(),
  toTankId: z.number().int().nullable(),
  fromTankCode: textField().nullable(),
  toTankCode: textField().nullable(),
  /** Fish moved (always positive); for a correction, the signed change. */
  count: z.number().int(),
  meanWeightG: z.number().nullable(),
  origin: textField().nullable(),
  permitRef: textField().nullable(),
  healthCertificateRef: textField().nullable(),
  transportWater: TransportWaterSchema.nullable(),
  destination: textField().nullable(),
  reason: textField().nullable(),
  cause: textField().nullable(),
  causeText: textField().nullable(),
  necropsy: z.boolean(),
  correctsId: z.number().int().nullable(),
  /** The round completion (or its amendment) that wrote it, when it came from the round. */
  completionId: textField().nullable(),
  note: textField().nullable(),
  personName: textField(),
  createdAt: textField(),
})
export type Movement = z.infer<typeof MovementSchema>

export const StockFiguresSchema = z.object({
  count: z.number().int(),
  biomassKg: z.number(),
  /** kg/m³ from the tank volume; null for a batch spread over tanks of unknown volume. */
  densityKgM3: z.number().nullable(),
})
export type StockFigures = z.infer<typeof StockFiguresSchema>

export const TankStockSchema = StockFiguresSchema.extend({
  tankId: z.number().int(),
  tankCode: textField(),
  volumeL: z.number(),
  batches: z.array(StockFiguresSchema.extend({ batchId: z.number().int(), batchCode: textField(), meanWeightG: z.number() })),
})
export type TankStock = z.infer<typeof TankStockSchema>

export const BatchStockSchema = StockFiguresSchema.extend({
  batchId: z.number().int(),
  batchCode: textField(),
  meanWeightG: z.number(),
  onRegister: z.boolean(),
  tanks: z.array(StockFiguresSchema.extend({ tankId: z.number().int(), tankCode: textField(), volumeL: z.number() })),
})
export type BatchStock = z.infer<typeof BatchStockSchema>

/** Fish on the register per tank id (JSON object keys are strings). */
export const OnHandByTankSchema = z.record(textField(), z.number().int())

export const MovementListQuerySchema = z.object({
  batchId: z.coerce.number().int().positive().optional(),
  tankId: z.coerce.number().int().positive().optional(),
})
export type MovementListQuery = z.infer<typeof MovementListQuerySchema>

export const StockSettingsSchema = z.object({
  /** The facility's own short list of causes of death; "unknown" and free text are always offered. */
  mortalityCauses: z.array(textField().trim().min(1).max(80)).max(40),
  /** Deaths in 7 days, as % of the batch, above which a flag is raised and an incident proposed. */
  mortalityWeekPct: z.number().positive().max(100),
  notifyWelfareOfficerHours: z
    .number()
    .int()
    .positive()
    .max(24 * 30),
  notifyCommitteeHours: z
    .number()
    .int()
    .positive()
    .max(24 * 60),
  fullReportHours: z
    .number()
    .int()
    .positive()
    .max(24 * 90),
})
export type StockSettings = z.infer<typeof StockSettingsSchema>
export const UpdateStockSettingsInputSchema = StockSettingsSchema.partial()
export type UpdateStockSettingsInput = z.infer<typeof UpdateStockSettingsInputSchema>
