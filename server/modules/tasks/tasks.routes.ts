import { Router } from 'express'
import { IdParamSchema } from '#shared/schemas/facility'
import { RoundQuerySchema } from '#shared/schemas/round'
import { TaskListQuerySchema } from '#shared/schemas/task'
import { requireRole, signedIn } from '../auth/require-role'
import { getRound } from './round.service'
import { createOneOffTask, getTask, listTasks } from './tasks.service'

export const tasksRouter = Router()

tasksRouter.get('/', signedIn, async (req, res) => {
  res.json(await listTasks(TaskListQuerySchema.parse(req.query)))
})
// Registered before '/:id' so "round" is not read as an id.
tasksRouter.get('/round', requireRole('manager', 'supervisor', 'technician'), async (req, res) => {
  res.json(await getRound(req.user!, RoundQuerySchema.parse(req.query).date))
})
tasksRouter.get('/:id', signedIn, async (req, res) => {
  res.json(await getTask(IdParamSchema.parse(req.params).id))
})
tasksRouter.post('/', requireRole('manager', 'supervisor'), async (req, res) => {
  res.status(201).json(await createOneOffTask(req.body))
})
