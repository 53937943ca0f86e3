import { Router } from 'express'
import { IdParamSchema } from '#shared/schemas/facility'
import { CylinderInputSchema, CylinderReadingInputSchema } from '#shared/schemas/oxygen'
import { requireRole, signedIn } from '../../lib/require-role'
import { createCylinder, listCylinders, recordCylinderReading } from './oxygen.service'

export const oxygenRouter = Router()

oxygenRouter.get('/oxygen/cylinders', signedIn, async (_req, res) => {
  res.json(await listCylinders())
})
oxygenRouter.post('/oxygen/cylinders', requireRole('manager', 'supervisor'), async (req, res) => {
  res.status(201).json(await createCylinder(CylinderInputSchema.parse(req.body)))
})
oxygenRouter.post('/oxygen/cylinders/:id/readings', requireRole('manager', 'supervisor', 'technician'), async (req, res) => {
  res.json(await recordCylinderReading(IdParamSchema.parse(req.params).id, CylinderReadingInputSchema.parse(req.body)))
})
