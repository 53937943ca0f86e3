import { Router } from 'express'
import { z } from 'zod'
import { calendarDate } from '#shared/schemas/calendar'
import { BatchRecordInputSchema } from '#shared/schemas/batch-record'
import { IdParamSchema } from '#shared/schemas/facility'
import { EventInputSchema, PlaybookInputSchema, UpdateEventInputSchema } from '#shared/schemas/playbook'
import { requireRole, signedIn } from '../../lib/require-role'
import { addBatchRecord, listBatchRecords } from './batch-records.service'
import { cancelEvent, endEvent, getEvent, listEvents, startEvent, updateEvent } from './events.service'
import { createPlaybook, getPlaybook, listPlaybooks, updatePlaybook } from './playbooks.service'

export const playbooksRouter = Router()
const planners = requireRole('manager', 'supervisor')
const doers = requireRole('manager', 'supervisor', 'technician')
const RangeSchema = z.object({ from: calendarDate().optional(), to: calendarDate().optional() })

playbooksRouter.get('/playbooks', signedIn, async (_req, res) => {
  res.json(await listPlaybooks())
})
playbooksRouter.get('/playbooks/:id', signedIn, async (req, res) => {
  res.json(await getPlaybook(IdParamSchema.parse(req.params).id))
})
playbooksRouter.post('/playbooks', requireRole('manager'), async (req, res) => {
  res.status(201).json(await createPlaybook(PlaybookInputSchema.parse(req.body)))
})
playbooksRouter.put('/playbooks/:id', requireRole('manager'), async (req, res) => {
  const { id } = IdParamSchema.parse(req.params)
  res.json(await updatePlaybook(id, PlaybookInputSchema.parse(req.body)))
})

playbooksRouter.get('/events', signedIn, async (req, res) => {
  const { from, to } = RangeSchema.parse(req.query)
  res.json(await listEvents(from, to))
})
playbooksRouter.get('/events/:id', signedIn, async (req, res) => {
  res.json(await getEvent(IdParamSchema.parse(req.params).id))
})
playbooksRouter.post('/events', planners, async (req, res) => {
  const event = await startEvent(EventInputSchema.parse(req.body), req.user!)
  res.status(201).json(event)
})
playbooksRouter.patch('/events/:id', planners, async (req, res) => {
  const { id } = IdParamSchema.parse(req.params)
  const event = await updateEvent(id, UpdateEventInputSchema.parse(req.body))
  res.json(event)
})
playbooksRouter.post('/events/:id/cancel', planners, async (req, res) => {
  const event = await cancelEvent(IdParamSchema.parse(req.params).id)
  res.json(event)
})
playbooksRouter.post('/events/:id/end', planners, async (req, res) => {
  const event = await endEvent(IdParamSchema.parse(req.params).id)
  res.json(event)
})

playbooksRouter.get('/batches/:id/records', signedIn, async (req, res) => {
  res.json(await listBatchRecords(IdParamSchema.parse(req.params).id))
})
playbooksRouter.post('/batches/:id/records', doers, async (req, res) => {
  const { id } = IdParamSchema.parse(req.params)
  res.status(201).json(await addBatchRecord(id, req.user!, BatchRecordInputSchema.parse(req.body)))
})
