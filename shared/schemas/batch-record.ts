import { z } from 'zod'
import { text } from './text'

export const TransportBoxRecordSchema = z.object({
  kind: z.literal('transport_box'),
  box: text().trim().min(1).max(40),
  doMgL: z.number().min(0).max(60),
  tempC: z.number().min(-2).max(45),
  pH: z.number().min(0).max(14),
  receivingTempC: z.number().min(-2).max(45),
  receivingPH: z.number().min(0).max(14),
})
export const TransportWaterRecordSchema = z.object({
  kind: z.literal('transport_water'),
  alkalinityMgL: z.number().min(0).max(1000),
  pH: z.number().min(0).max(14),
  tanMgL: z.number().min(0).max(100),
  nitriteMgL: z.number().min(0).max(100),
  tempC: z.number().min(-2).max(45),
  salinity: z.number().min(0).max(45).default(0),
})
export const WeighingRecordSchema = z.object({
  kind: z.literal('weighing'),
  weightsG: z.array(z.number().positive('Weights must be above 0').max(100_000)).min(2, 'Weigh at least two fish').max(500),
  /** When true, the batch's mean weight (and so its rations) takes this sample's mean. */
  updateBatchMean: z.boolean().default(true),
})
export const BathRecordSchema = z.object({
  kind: z.literal('bath'),
  product: text().trim().min(1).max(120),
  targetMgL: z.number().positive().max(10_000),
  volumeL: z.number().positive().max(1_000_000),
  purityPct: z.number().positive().max(100),
  gramsWeighed: z.number().positive().max(1_000_000),
  minutes: z
    .number()
    .int()
    .positive()
    .max(24 * 60),
  observations: text().trim().max(2000).default(''),
})
export const NoteRecordSchema = z.object({ kind: z.enum(['note', 'review']), text: text().trim().min(1).max(4000) })

export const BatchRecordInputSchema = z
  .discriminatedUnion('kind', [TransportBoxRecordSchema, TransportWaterRecordSchema, WeighingRecordSchema, BathRecordSchema, NoteRecordSchema])
  .and(z.object({ eventId: z.number().int().positive().nullable().default(null) }))
export type BatchRecordInput = z.input<typeof BatchRecordInputSchema>
export type ParsedBatchRecordInput = z.output<typeof BatchRecordInputSchema>

export const BatchRecordSchema = z.object({
  id: z.number().int(),
  batchId: z.number().int(),
  eventId: z.number().int().nullable(),
  kind: text(),
  data: z.record(text(), z.unknown()),
  personName: text(),
  createdAt: text(),
})
export type BatchRecord = z.infer<typeof BatchRecordSchema>
