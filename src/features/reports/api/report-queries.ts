import { queryOptions } from '@tanstack/react-query'
import { z } from 'zod'
import { apiFetch } from '../../../lib/api-client'
import { reportPath, type AuditFilter, type ComplianceFilter, type DateRange, type WelfareFilter } from '../utils/report-paths'
import {
  AuditRowSchema, ComplianceRowSchema, ReportAreaSchema, ReportTankSchema, ResponseRowSchema, StaffNameSchema, WelfareRowSchema,
} from './report-schemas'

export const reportKeys = {
  all: ['reports'] as const,
  report: (name: string, filter: object) => [...reportKeys.all, name, filter] as const,
  reference: (name: string) => [...reportKeys.all, 'reference', name] as const,
}

export const reportQueries = {
  compliance: (f: ComplianceFilter) =>
    queryOptions({ queryKey: reportKeys.report('compliance', f), queryFn: () => apiFetch(reportPath('compliance', f), z.array(ComplianceRowSchema)) }),
  responses: (f: DateRange) =>
    queryOptions({ queryKey: reportKeys.report('responses', f), queryFn: () => apiFetch(reportPath('responses', f), z.array(ResponseRowSchema)) }),
  welfare: (f: WelfareFilter) =>
    queryOptions({ queryKey: reportKeys.report('welfare', f), queryFn: () => apiFetch(reportPath('welfare', f), z.array(WelfareRowSchema)) }),
  audit: (f: AuditFilter) => queryOptions({ queryKey: reportKeys.report('audit', f), queryFn: () => apiFetch(reportPath('audit', f), z.array(AuditRowSchema)) }),
  facility: () =>
    queryOptions({
      queryKey: reportKeys.reference('facility'),
      queryFn: () => apiFetch('/facility', z.object({ name: z.string(), timeZone: z.string() })),
      staleTime: 5 * 60_000,
    }),
  tanks: () => queryOptions({ queryKey: reportKeys.reference('tanks'), queryFn: () => apiFetch('/tanks', z.array(ReportTankSchema)) }),
  areas: () => queryOptions({ queryKey: reportKeys.reference('areas'), queryFn: () => apiFetch('/areas', z.array(ReportAreaSchema)) }),
  /** Supervisors and managers only; observers see person numbers instead of names. */
  staff: () => queryOptions({ queryKey: reportKeys.reference('staff'), queryFn: () => apiFetch('/staff', z.array(StaffNameSchema)), retry: false }),
}
