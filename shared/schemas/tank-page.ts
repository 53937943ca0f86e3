import { z } from 'zod'
import { BatchRecordSchema } from './batch-record'
import { AreaSchema, BatchSchema, SystemSchema, TankSchema } from './facility'
import { ReadingSchema } from './completion'
import { LIMIT_SCOPES } from './parameter'
import { EventSchema } from './playbook'
import { TaskSchema } from './task'
import { text } from './text'

// The answers of the tank page's endpoints: GET /tanks/:id/overview and GET /tanks/:id/readings.
const bound = z.number().nullable()

/** A parameter with the limit that applies at this tank (its batch's, else its system's, else the facility's), or none. */
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

/** A tank's place, batches, limits, latest tasks and events, and its batches' latest records. */
export const TankOverviewSchema = z.object({
  tank: TankSchema,
  area: AreaSchema.nullable(),
  system: SystemSchema.nullable(),
  batches: z.array(BatchSchema),
  batchRecords: z.array(BatchRecordSchema.pick({ id: true, batchId: true, kind: true, data: true, createdAt: true })),
  limits: z.array(TankLimitSchema),
  recentTasks: z.array(TaskSchema),
  events: z.array(EventSchema.pick({ id: true, title: true, kind: true, localStart: true, status: true })),
})
export type TankOverview = z.infer<typeof TankOverviewSchema>

/** One current reading on a trend chart. */
export const TrendReadingSchema = ReadingSchema.extend({ takenAt: text() })
export type TrendReading = z.infer<typeof TrendReadingSchema>

/** The tank's own readings, its system's (chemistry sampled at the loop) and deaths per facility day. */
export const TankReadingsSchema = z.object({
  tank: z.array(TrendReadingSchema),
  system: z.array(TrendReadingSchema),
  mortalityByDay: z.array(z.object({ date: text(), count: z.number() })),
})
export type TankReadings = z.infer<typeof TankReadingsSchema>

/** The readings window: two instants with offsets, ending after it starts. */
export const TankReadingsQuerySchema = z
  .object({ from: text().datetime({ offset: true }), to: text().datetime({ offset: true }) })
  .refine((x) => x.to > x.from, { path: ['to'], message: 'Ends before it starts' })
