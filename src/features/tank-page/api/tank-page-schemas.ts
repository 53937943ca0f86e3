import { z } from 'zod'
import { text } from '#shared/schemas/text'
import { AreaSchema, BatchSchema, SystemSchema, TankSchema } from '#shared/schemas/facility'
import { BandSchema, LIMIT_SCOPES } from '#shared/schemas/parameter'
import { TaskSchema } from '#shared/schemas/task'

// The tank page endpoints have no shared schema yet, so the page pins the shapes it reads here.
const bound = z.number().nullable()

export const TankLimitSchema = z.object({
  key: text(),
  name: text(),
  unit: text(),
  derived: z.boolean(),
  scope: z.enum(LIMIT_SCOPES).nullable(),
  okMin: bound,
  okMax: bound,
  criticalMin: bound,
  criticalMax: bound,
})
export type TankLimit = z.infer<typeof TankLimitSchema>

export const TankOverviewSchema = z.object({
  tank: TankSchema,
  area: AreaSchema.nullable(),
  system: SystemSchema.nullable(),
  batches: z.array(BatchSchema),
  batchRecords: z.array(z.object({ id: z.number().int(), batchId: z.number().int(), kind: text(), createdAt: text() })),
  limits: z.array(TankLimitSchema),
  recentTasks: z.array(TaskSchema),
  events: z.array(z.object({ id: z.number().int(), title: text(), kind: text(), localStart: text(), status: text() })),
})
export type TankOverview = z.infer<typeof TankOverviewSchema>

export const TrendReadingSchema = z.object({
  parameterKey: text(),
  value: z.number(),
  unit: text(),
  band: BandSchema,
  derived: z.boolean(),
  takenAt: text(),
})
export type TrendReading = z.infer<typeof TrendReadingSchema>

export const TankReadingsSchema = z.object({
  tank: z.array(TrendReadingSchema),
  system: z.array(TrendReadingSchema),
  mortalityByDay: z.array(z.object({ date: text(), count: z.number() })),
})
export type TankReadings = z.infer<typeof TankReadingsSchema>
