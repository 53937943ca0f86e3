import { Router } from 'express'
import { IdParamSchema } from '#shared/schemas/facility'
import { TaskListQuerySchema } from '#shared/schemas/task'
import { requireRole, signedIn } from '../auth/require-role'
import { createOneOffTask, getTask, listTasks } from './tasks.service'

export const tasksRouter = Router()

tasksRouter.get('/', signedIn, async (req, res) => {
  res.json(await listTasks(TaskListQuerySchema.parse(req.query)))
})
tasksRouter.get('/:id', signedIn, async (req, res) => {
  res.json(await getTask(IdParamSchema.parse(req.params).id))
})
tasksRouter.post('/', requireRole('manager', 'supervisor'), async (req, res) => {
  res.status(201).json(await createOneOffTask(req.body))
})
