import { queryOptions } from '@tanstack/react-query'
import { z } from 'zod'
import { apiFetch } from '../../../lib/api-client'
import { IncidentReportRowSchema, StockReportRowSchema } from '#shared/schemas/animal-report'
import { reportPath, type AuditFilter, type ComplianceFilter, type DateRange, type StockFilter, type WelfareFilter } from '../utils/report-paths'
import { AuditRowSchema, ComplianceRowSchema, ResponseRowSchema, WelfareRowSchema } from '#shared/schemas/report'

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
  stock: (f: StockFilter) =>
    queryOptions({ queryKey: reportKeys.report('stock', f), queryFn: () => apiFetch(reportPath('stock', f), z.array(StockReportRowSchema)) }),
  incidents: (f: DateRange) =>
    queryOptions({ queryKey: reportKeys.report('incidents', f), queryFn: () => apiFetch(reportPath('incidents', f), z.array(IncidentReportRowSchema)) }),
  audit: (f: AuditFilter) =>
    queryOptions({ queryKey: reportKeys.report('audit', f), queryFn: () => apiFetch(reportPath('audit', f), z.array(AuditRowSchema)) }),
}
