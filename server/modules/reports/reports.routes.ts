import { Router } from 'express'
import { z } from 'zod'
import { AnimalReportQuerySchema, INCIDENT_REPORT_COLUMNS, ReportRangeSchema, STOCK_REPORT_COLUMNS } from '#shared/schemas/animal-report'
import { text } from '#shared/schemas/text'
import { toCsv } from '../../lib/csv'
import { requireRole } from '../auth/require-role'
import { AuditEntity } from '../audit/audit.entity'
import { db } from '../../db/data-source'
import { incidentReport, stockReport } from './animal-record.service'
import { complianceReport, responseReport, welfareReport } from './reports.service'
import { tankOverview, tankReadings } from './tank-overview.service'

export const reportsRouter = Router()
const readers = requireRole('manager', 'supervisor', 'observer')

function send(res: import('express').Response, format: 'json' | 'csv', name: string, rows: object[], columns: string[]) {
  if (format === 'json') return res.json(rows)
  res.setHeader('content-type', 'text/csv; charset=utf-8')
  res.setHeader('content-disposition', `attachment; filename="${name}.csv"`)
  res.send(toCsv(rows as Array<Record<string, unknown>>, columns))
}

reportsRouter.get('/reports/compliance', readers, async (req, res) => {
  const q = ReportRangeSchema.and(z.object({ by: z.enum(['category', 'area', 'person']).default('category'), period: z.enum(['day', 'week']).default('day') })).parse(req.query)
  const rows = await complianceReport(q.from, q.to, q.by, q.period)
  send(res, q.format, `compliance-${q.by}-${q.from}-${q.to}`, rows as never, ['period', 'group', 'total', 'onTime', 'late', 'missed', 'skipped', 'held', 'open', 'onTimeRate'])
})

reportsRouter.get('/reports/responses', readers, async (req, res) => {
  const q = ReportRangeSchema.parse(req.query)
  const rows = await responseReport(q.from, q.to)
  send(res, q.format, `responses-${q.from}-${q.to}`, rows, ['date', 'time', 'task', 'where', 'flag', 'alert', 'alertStartedAt', 'acknowledgedBy', 'minutesToAcknowledge', 'recheckStatus', 'minutesToRecheck'])
})

reportsRouter.get('/reports/welfare', readers, async (req, res) => {
  const q = ReportRangeSchema.and(z.object({ tankIds: text().regex(/^\d+(,\d+)*$/, 'Tank ids separated by commas').optional() })).parse(req.query)
  const rows = await welfareReport(q.from, q.to, q.tankIds ? q.tankIds.split(',').map(Number) : [])
  send(res, q.format, `welfare-${q.from}-${q.to}`, rows, ['date', 'due', 'task', 'tank', 'status', 'doneAt', 'doneBy', 'lateMinutes', 'readings', 'flag'])
})

// The animal record for a committee: numbers per batch and tank, and incidents with their deadlines.
reportsRouter.get('/reports/stock', readers, async (req, res) => {
  const q = AnimalReportQuerySchema.parse(req.query)
  const rows = await stockReport(q.from, q.to, q.batchId)
  send(res, q.format, `stock-${q.from}-${q.to}`, rows, STOCK_REPORT_COLUMNS)
})

reportsRouter.get('/reports/incidents', readers, async (req, res) => {
  const q = ReportRangeSchema.parse(req.query)
  const rows = await incidentReport(q.from, q.to)
  send(res, q.format, `incidents-${q.from}-${q.to}`, rows, INCIDENT_REPORT_COLUMNS)
})

reportsRouter.get('/tanks/:id/overview', requireRole('manager', 'supervisor', 'technician', 'observer'), async (req, res) => {
  res.json(await tankOverview(z.object({ id: z.coerce.number().int().positive() }).parse(req.params).id))
})

reportsRouter.get('/tanks/:id/readings', requireRole('manager', 'supervisor', 'technician', 'observer'), async (req, res) => {
  const { id } = z.object({ id: z.coerce.number().int().positive() }).parse(req.params)
  const q = z.object({ from: text().datetime({ offset: true }), to: text().datetime({ offset: true }) }).refine((x) => x.to > x.from, { path: ['to'], message: 'Ends before it starts' }).parse(req.query)
  res.json(await tankReadings(id, new Date(q.from), new Date(q.to)))
})

reportsRouter.get('/audit', requireRole('manager', 'supervisor', 'observer'), async (req, res) => {
  const q = ReportRangeSchema.and(z.object({ entity: text().max(20).optional() })).parse(req.query)
  const qb = db().getRepository(AuditEntity).createQueryBuilder('a').where('a.at BETWEEN :from AND :to', { from: new Date(`${q.from}T00:00:00Z`), to: new Date(`${q.to}T23:59:59.999Z`) })
  if (q.entity) qb.andWhere('a.entity = :entity', { entity: q.entity })
  const found = await qb.orderBy('a.id', 'DESC').take(1000).getMany()
  // before/after travel as JSON text, the same in the JSON answer and in a CSV cell.
  const rows = found.map((r) => ({ ...r, at: r.at.toISOString(), before: JSON.stringify(r.before), after: JSON.stringify(r.after) }))
  send(res, q.format, `audit-${q.from}-${q.to}`, rows, ['id', 'at', 'personId', 'entity', 'entityId', 'action', 'before', 'after'])
})
