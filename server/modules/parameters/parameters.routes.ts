import { Router } from 'express'
import { IdParamSchema } from '#shared/schemas/facility'
import { LimitInputSchema } from '#shared/schemas/parameter'
import { requireRole, signedIn } from '../../lib/require-role'
import { deleteLimit, listLimits, listParameters, upsertLimit } from './parameters.service'

export const parametersRouter = Router()

parametersRouter.get('/parameters', signedIn, async (_req, res) => {
  res.json(await listParameters())
})
parametersRouter.get('/limits', signedIn, async (_req, res) => {
  res.json(await listLimits())
})
parametersRouter.put('/limits', requireRole('manager'), async (req, res) => {
  res.json(await upsertLimit(LimitInputSchema.parse(req.body)))
})
parametersRouter.delete('/limits/:id', requireRole('manager'), async (req, res) => {
  await deleteLimit(IdParamSchema.parse(req.params).id)
  res.status(204).end()
})
