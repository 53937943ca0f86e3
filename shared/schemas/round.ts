import { z } from 'zod'
import { text } from './text'
import { calendarDate } from './calendar'
import { TaskSchema } from './task'

export const ReadingSpecSchema = z.object({
  key: text(),
  name: text(),
  unit: text(),
  decimals: z.number().int(),
  physicalMin: z.number(),
  physicalMax: z.number(),
  okMin: z.number().nullable(),
  okMax: z.number().nullable(),
  criticalMin: z.number().nullable(),
  criticalMax: z.number().nullable(),
})
export type ReadingSpec = z.infer<typeof ReadingSpecSchema>

export const RoundTaskSchema = TaskSchema.extend({
  /** The readings this task needs, with the limits that apply at its tank or system. */
  readingSpecs: z.array(ReadingSpecSchema),
  salinitySetpoint: z.number().nullable(),
  /** Feeding tasks: grams for this feed from the batch's biomass and feeding rate. */
  rationG: z.number().nullable().optional(),
})
export type RoundTask = z.infer<typeof RoundTaskSchema>

export const RoundSchema = z.object({
  date: text(),
  timeZone: text(),
  areas: z.array(z.object({ id: z.number().int(), name: text(), roundOrder: z.number().int(), quarantine: z.boolean() })),
  tasks: z.array(RoundTaskSchema),
})
export type Round = z.infer<typeof RoundSchema>

export const RoundQuerySchema = z.object({ date: calendarDate().optional() })
