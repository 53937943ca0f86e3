import { queryOptions } from '@tanstack/react-query'
import { z } from 'zod'
import { apiFetch } from '../../../lib/api-client'
import { reportPath, type AuditFilter, type ComplianceFilter, type DateRange, type WelfareFilter } from '../utils/report-paths'
import { AuditRowSchema, ComplianceRowSchema, ResponseRowSchema, WelfareRowSchema } from './report-schemas'

export const reportKeys = {
  all: ['reports'] as const,
  report: (name: string, filter: object) => [...reportKeys.all, name, filter] as const,
}

export const reportQueries = {
  compliance: (f: ComplianceFilter) =>
    queryOptions({ queryKey: reportKeys.report('compliance', f), queryFn: () => apiFetch(reportPath('compliance', f), z.array(ComplianceRowSchema)) }),
  responses: (f: DateRange) =>
    queryOptions({ queryKey: reportKeys.report('responses', f), queryFn: () => apiFetch(reportPath('responses', f), z.array(ResponseRowSchema)) }),
  welfare: (f: WelfareFilter) =>
    queryOptions({ queryKey: reportKeys.report('welfare', f), queryFn: () => apiFetch(reportPath('welfare', f), z.array(WelfareRowSchema)) }),
  audit: (f: AuditFilter) => queryOptions({ queryKey: reportKeys.report('audit', f), queryFn: () => apiFetch(reportPath('audit', f), z.array(AuditRowSchema)) }),
}
