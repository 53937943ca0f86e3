import { z } from 'zod'
import { ReportRangeSchema } from './animal-report'
import { TaskStatusSchema } from './task'
import { text } from './text'

// The answers of the compliance, response, welfare and audit reports (the stock and incident reports are in animal-report.ts).
// Each row is flat so the same object is a JSON row and a CSV line; an empty cell is ''.
const count = z.number().int()

export const COMPLIANCE_GROUPINGS = ['category', 'area', 'person'] as const
export type ComplianceGrouping = (typeof COMPLIANCE_GROUPINGS)[number]
export const REPORT_PERIODS = ['day', 'week'] as const
export type ReportPeriod = (typeof REPORT_PERIODS)[number]

/** The compliance report's question: the range, grouped by category, area or person, per day or week. */
export const ComplianceQuerySchema = ReportRangeSchema.and(
  z.object({ by: z.enum(COMPLIANCE_GROUPINGS).default('category'), period: z.enum(REPORT_PERIODS).default('day') }),
)

/** The welfare report's question: the range and, optionally, tank ids separated by commas. */
export const WelfareQuerySchema = ReportRangeSchema.and(
  z.object({
    tankIds: text()
      .regex(/^\d+(,\d+)*$/, 'Tank ids separated by commas')
      .optional(),
  }),
)

/** The audit trail's question: the range and, optionally, one kind of record. */
export const AuditQuerySchema = ReportRangeSchema.and(z.object({ entity: text().max(20).optional() }))

/** Tasks of one period and group: done on time, done late, missed, skipped, held, still open. */
export const ComplianceRowSchema = z.object({
  period: text(),
  group: text(),
  total: count,
  onTime: count,
  late: count,
  missed: count,
  skipped: count,
  held: count,
  open: count,
  /** Done on time as a share of the tasks that were due and not held; null when none were. */
  onTimeRate: z.number().nullable(),
})
export type ComplianceRow = z.infer<typeof ComplianceRowSchema>

/** A flagged or missed task: its alert, who acknowledged it and how fast, and its recheck. */
export const ResponseRowSchema = z.object({
  date: text(),
  time: text(),
  task: text(),
  where: text(),
  flag: text(),
  alert: text(),
  alertStartedAt: text(),
  acknowledgedBy: text(),
  minutesToAcknowledge: z.number().nullable(),
  recheckStatus: text(),
  minutesToRecheck: z.number().nullable(),
})
export type ResponseRow = z.infer<typeof ResponseRowSchema>

/** One welfare or quarantine check with its readings, who did it and when. */
export const WelfareRowSchema = z.object({
  date: text(),
  due: text(),
  task: text(),
  tank: text(),
  status: TaskStatusSchema,
  doneAt: text(),
  doneBy: text(),
  lateMinutes: z.union([z.number(), z.literal('')]),
  readings: text(),
  flag: text(),
})
export type WelfareRow = z.infer<typeof WelfareRowSchema>

/** One change on the audit trail. */
export const AuditRowSchema = z.object({
  id: text(),
  at: text(),
  personId: z.number().int().nullable(),
  entity: text(),
  entityId: text(),
  action: text(),
  /** JSON text, the same in the JSON answer and in a CSV cell. */
  before: text(),
  after: text(),
})
export type AuditRow = z.infer<typeof AuditRowSchema>

export const COMPLIANCE_COLUMNS = Object.keys(ComplianceRowSchema.shape) as Array<keyof ComplianceRow>
export const RESPONSE_COLUMNS = Object.keys(ResponseRowSchema.shape) as Array<keyof ResponseRow>
export const WELFARE_COLUMNS = Object.keys(WelfareRowSchema.shape) as Array<keyof WelfareRow>
export const AUDIT_COLUMNS = Object.keys(AuditRowSchema.shape) as Array<keyof AuditRow>
