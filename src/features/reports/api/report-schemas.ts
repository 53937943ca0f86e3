import { z } from 'zod'

// The report endpoints have no shared zod schemas yet (shared/reports/compliance.ts has an interface only).
const count = z.number().int()
export const ComplianceRowSchema = z.object({
  period: z.string(),
  group: z.string(),
  total: count,
  onTime: count,
  late: count,
  missed: count,
  skipped: count,
  held: count,
  open: count,
  onTimeRate: z.number().nullable(),
})
export type ComplianceRow = z.infer<typeof ComplianceRowSchema>

export const ResponseRowSchema = z.object({
  date: z.string(),
  time: z.string(),
  task: z.string(),
  where: z.string(),
  flag: z.string(),
  alert: z.string(),
  alertStartedAt: z.string(),
  acknowledgedBy: z.string(),
  minutesToAcknowledge: z.number().nullable(),
  recheckStatus: z.string(),
  minutesToRecheck: z.number().nullable(),
})
export type ResponseRow = z.infer<typeof ResponseRowSchema>

export const WelfareRowSchema = z.object({
  date: z.string(),
  due: z.string(),
  task: z.string(),
  tank: z.string(),
  status: z.string(),
  doneAt: z.string(),
  doneBy: z.string(),
  lateMinutes: z.union([z.number(), z.literal('')]),
  readings: z.string(),
  flag: z.string(),
})
export type WelfareRow = z.infer<typeof WelfareRowSchema>

export const AuditRowSchema = z.object({
  id: z.union([z.string(), z.number()]).transform(String),
  at: z.string(),
  personId: z.number().int().nullable(),
  entity: z.string(),
  entityId: z.string(),
  action: z.string(),
  /** JSON text, as the server stores it. */
  before: z.string(),
  after: z.string(),
})
export type AuditRow = z.infer<typeof AuditRowSchema>

