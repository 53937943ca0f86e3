import { z } from 'zod'
import { DEADLINE_STATES } from '../incidents/deadlines'
import { INCIDENT_SOURCES, IncidentStatusSchema } from './incident'
import { calendarDate } from './calendar'
import { text } from './text'

/** Every report's question: facility days from–to (at most a year), as JSON or CSV. */
export const ReportRangeSchema = z
  .object({ from: calendarDate(), to: calendarDate(), format: z.enum(['json', 'csv']).default('json') })
  .refine((q) => q.to >= q.from, { path: ['to'], message: 'Ends before it starts' })
  .refine((q) => (Date.parse(q.to) - Date.parse(q.from)) / 86_400_000 <= 366, { path: ['to'], message: 'Ask for at most a year at a time' })

/** The animal-record report's question: the range, one batch or all. */
export const AnimalReportQuerySchema = ReportRangeSchema.and(z.object({ batchId: z.coerce.number().int().positive().optional() }))

const count = z.number().int()

/**
 * One line of the stock report: a batch in one tank, or the batch over all its tanks (tankId
 * null). opening + arrived + movedIn − movedOut − died − culled − used − dispatched + corrected
 * = closing, and `balanced` says the closing count is also what the register holds at the end.
 */
export const StockReportRowSchema = z.object({
  batchId: count,
  batchCode: text(),
  species: text(),
  tankId: count.nullable(),
  /** The tank's code, or "All tanks" on the batch's own line. */
  tank: text(),
  opening: count,
  arrived: count,
  /** Fish moved into and out of this tank within the batch (transfers and gradings); on the batch line they are equal. */
  movedIn: count,
  movedOut: count,
  died: count,
  /** "cause n; cause n", largest first. */
  diedByCause: text(),
  culled: count,
  /** Sampled for research. */
  used: count,
  dispatched: count,
  corrected: count,
  closing: count,
  balanced: z.boolean(),
})
export type StockReportRow = z.infer<typeof StockReportRowSchema>

export const STOCK_REPORT_COLUMNS = Object.keys(StockReportRowSchema.shape) as Array<keyof StockReportRow>

export const DeadlineStateSchema = z.enum(DEADLINE_STATES)

/** One incident of the period with each of its three deadlines met or missed. */
export const IncidentReportRowSchema = z.object({
  id: count,
  title: text(),
  status: IncidentStatusSchema,
  source: z.enum(INCIDENT_SOURCES),
  noticedAt: text(),
  tanks: text(),
  /** Lost, hurt or dead (an escape loses fish without a death). */
  affected: count,
  dead: count,
  welfareDueAt: text(),
  welfareDoneAt: text(),
  welfare: DeadlineStateSchema,
  committeeDueAt: text(),
  committeeDoneAt: text(),
  committee: DeadlineStateSchema,
  reportDueAt: text(),
  reportDoneAt: text(),
  report: DeadlineStateSchema,
})
export type IncidentReportRow = z.infer<typeof IncidentReportRowSchema>

export const INCIDENT_REPORT_COLUMNS = Object.keys(IncidentReportRowSchema.shape) as Array<keyof IncidentReportRow>
