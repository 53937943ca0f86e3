import { Router } from 'express'
import { IdParamSchema } from '#shared/schemas/facility'
import { RoundQuerySchema } from '#shared/schemas/round'
import { CreateTaskInputSchema, TaskListQuerySchema } from '#shared/schemas/task'
import { z } from 'zod'
import { calendarDate } from '#shared/schemas/calendar'
import { forbidden } from '../../lib/errors'
import { requireRole, signedIn } from '../../lib/require-role'
import { getBoard } from './board.service'
import { getRound, getRoundSheet } from './round.service'
import { createOneOffTask, getTask, listTasks } from './tasks.service'

export const tasksRouter = Router()

tasksRouter.get('/', signedIn, async (req, res) => {
  res.json(await listTasks(TaskListQuerySchema.parse(req.query)))
})
// Registered before '/:id' so "round" is not read as an id.
tasksRouter.get('/round', requireRole('manager', 'supervisor', 'technician'), async (req, res) => {
  res.json(await getRound(req.user!, RoundQuerySchema.parse(req.query).date))
})
tasksRouter.get('/round-sheet', requireRole('manager', 'supervisor', 'technician'), async (req, res) => {
  const q = z
    .object({ date: calendarDate(), personId: z.coerce.number().int().positive().optional(), areaId: z.coerce.number().int().positive().optional() })
    .refine((x) => x.personId || x.areaId, { message: 'Choose a person or an area', path: ['personId'] })
    .parse(req.query)
  // A technician prints their own sheet or an area's, not a colleague's.
  if (req.user!.role === 'technician' && q.personId && q.personId !== req.user!.id) throw forbidden('Technicians can print their own round sheet or an area’s.')
  res.json(await getRoundSheet(q.date, q))
})
tasksRouter.get('/board', signedIn, async (req, res) => {
  const { date } = z.object({ date: calendarDate() }).parse(req.query)
  res.json(await getBoard(date))
})
tasksRouter.get('/:id', signedIn, async (req, res) => {
  res.json(await getTask(IdParamSchema.parse(req.params).id))
})
tasksRouter.post('/', requireRole('manager', 'supervisor'), async (req, res) => {
  res.status(201).json(await createOneOffTask(CreateTaskInputSchema.parse(req.body)))
})
