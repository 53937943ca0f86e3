import { Router } from 'express'
import { IdParamSchema } from '#shared/schemas/facility'
import { RoutineInputSchema, UpdateRoutineInputSchema } from '#shared/schemas/routine'
import { requireRole } from '../../lib/require-role'
import { createRoutine, deleteRoutine, getRoutine, listRoutines, updateRoutine } from './routines.service'

export const routinesRouter = Router()
const readers = requireRole('manager', 'supervisor', 'observer', 'technician')
const editors = requireRole('manager', 'supervisor')

routinesRouter.get('/', readers, async (_req, res) => {
  res.json(await listRoutines())
})
routinesRouter.get('/:id', readers, async (req, res) => {
  res.json(await getRoutine(IdParamSchema.parse(req.params).id))
})
routinesRouter.post('/', editors, async (req, res) => {
  res.status(201).json(await createRoutine(RoutineInputSchema.parse(req.body)))
})
routinesRouter.put('/:id', editors, async (req, res) => {
  const { id } = IdParamSchema.parse(req.params)
  res.json(await updateRoutine(id, UpdateRoutineInputSchema.parse(req.body)))
})
routinesRouter.delete('/:id', requireRole('manager'), async (req, res) => {
  await deleteRoutine(IdParamSchema.parse(req.params).id)
  res.status(204).end()
})
