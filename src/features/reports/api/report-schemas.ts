import { z } from 'zod'
import { text } from '#shared/schemas/text'

// The report endpoints have no shared zod schemas yet (shared/reports/compliance.ts has an interface only).
const count = z.number().int()
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
  onTimeRate: z.number().nullable(),
})
export type ComplianceRow = z.infer<typeof ComplianceRowSchema>

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

export const WelfareRowSchema = z.object({
  date: text(),
  due: text(),
  task: text(),
  tank: text(),
  status: text(),
  doneAt: text(),
  doneBy: text(),
  lateMinutes: z.union([z.number(), z.literal('')]),
  readings: text(),
  flag: text(),
})
export type WelfareRow = z.infer<typeof WelfareRowSchema>

export const AuditRowSchema = z.object({
  id: z.union([text(), z.number()]).transform(String),
  at: text(),
  personId: z.number().int().nullable(),
  entity: text(),
  entityId: text(),
  action: text(),
  /** JSON text, as the server stores it. */
  before: text(),
  after: text(),
})
export type AuditRow = z.infer<typeof AuditRowSchema>

