import { Router } from 'express'
import { AnimalReportQuerySchema, INCIDENT_REPORT_COLUMNS, ReportRangeSchema, STOCK_REPORT_COLUMNS } from '#shared/schemas/animal-report'
import { IdParamSchema } from '#shared/schemas/facility'
import {
  AUDIT_COLUMNS,
  AuditQuerySchema,
  COMPLIANCE_COLUMNS,
  ComplianceQuerySchema,
  RESPONSE_COLUMNS,
  WELFARE_COLUMNS,
  WelfareQuerySchema,
} from '#shared/schemas/report'
import { TankReadingsQuerySchema } from '#shared/schemas/tank-page'
import { toCsv } from '../../lib/csv'
import { auditTrail } from '../audit/audit-trail'
import { requireRole } from '../../lib/require-role'
import { incidentReport, stockReport } from './animal-record.service'
import { complianceReport, responseReport, welfareReport } from './reports.service'
import { tankOverview, tankReadings } from './tank-overview.service'

export const reportsRouter = Router()
const readers = requireRole('manager', 'supervisor', 'observer')
const everyone = requireRole('manager', 'supervisor', 'technician', 'observer')

function send<Row extends object>(
  res: import('express').Response,
  format: 'json' | 'csv',
  name: string,
  rows: Row[],
  columns: ReadonlyArray<keyof Row & string>,
) {
  if (format === 'json') return res.json(rows)
  res.setHeader('content-type', 'text/csv; charset=utf-8')
  res.setHeader('content-disposition', `attachment; filename="${name}.csv"`)
  res.send(toCsv(rows as Array<Record<string, unknown>>, [...columns]))
}

reportsRouter.get('/reports/compliance', readers, async (req, res) => {
  const q = ComplianceQuerySchema.parse(req.query)
  send(res, q.format, `compliance-${q.by}-${q.from}-${q.to}`, await complianceReport(q.from, q.to, q.by, q.period), COMPLIANCE_COLUMNS)
})

reportsRouter.get('/reports/responses', readers, async (req, res) => {
  const q = ReportRangeSchema.parse(req.query)
  send(res, q.format, `responses-${q.from}-${q.to}`, await responseReport(q.from, q.to), RESPONSE_COLUMNS)
})

reportsRouter.get('/reports/welfare', readers, async (req, res) => {
  const q = WelfareQuerySchema.parse(req.query)
  send(res, q.format, `welfare-${q.from}-${q.to}`, await welfareReport(q.from, q.to, q.tankIds ? q.tankIds.split(',').map(Number) : []), WELFARE_COLUMNS)
})

// The animal record for a committee: numbers per batch and tank, and incidents with their deadlines.
reportsRouter.get('/reports/stock', readers, async (req, res) => {
  const q = AnimalReportQuerySchema.parse(req.query)
  send(res, q.format, `stock-${q.from}-${q.to}`, await stockReport(q.from, q.to, q.batchId), STOCK_REPORT_COLUMNS)
})

reportsRouter.get('/reports/incidents', readers, async (req, res) => {
  const q = ReportRangeSchema.parse(req.query)
  send(res, q.format, `incidents-${q.from}-${q.to}`, await incidentReport(q.from, q.to), INCIDENT_REPORT_COLUMNS)
})

reportsRouter.get('/tanks/:id/overview', everyone, async (req, res) => {
  res.json(await tankOverview(IdParamSchema.parse(req.params).id))
})

reportsRouter.get('/tanks/:id/readings', everyone, async (req, res) => {
  const { id } = IdParamSchema.parse(req.params)
  const q = TankReadingsQuerySchema.parse(req.query)
  res.json(await tankReadings(id, new Date(q.from), new Date(q.to)))
})

reportsRouter.get('/audit', readers, async (req, res) => {
  const q = AuditQuerySchema.parse(req.query)
  send(res, q.format, `audit-${q.from}-${q.to}`, await auditTrail(q.from, q.to, q.entity), AUDIT_COLUMNS)
})
