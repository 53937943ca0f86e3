import { Router } from 'express'
import { IdParamSchema } from '#shared/schemas/facility'
import { MovementInputSchema, MovementListQuerySchema, UpdateStockSettingsInputSchema } from '#shared/schemas/stock'
import { requireRole, signedIn } from '../../lib/require-role'
import { getStockSettings, updateStockSettings } from './stock-settings.service'
import { batchStock, listMovements, onHandByTank, recordMovement, tankStock } from './stock.service'

export const stockRouter = Router()

stockRouter.get('/stock/movements', signedIn, async (req, res) => {
  res.json(await listMovements(MovementListQuerySchema.parse(req.query)))
})
stockRouter.post('/stock/movements', requireRole('manager', 'supervisor', 'technician'), async (req, res) => {
  res.status(201).json(await recordMovement(req.user!, MovementInputSchema.parse(req.body)))
})
stockRouter.get('/stock/on-hand', signedIn, async (_req, res) => {
  res.json(await onHandByTank())
})
stockRouter.get('/tanks/:id/stock', signedIn, async (req, res) => {
  res.json(await tankStock(IdParamSchema.parse(req.params).id))
})
stockRouter.get('/batches/:id/stock', signedIn, async (req, res) => {
  res.json(await batchStock(IdParamSchema.parse(req.params).id))
})
stockRouter.get('/stock/settings', signedIn, async (_req, res) => {
  res.json(await getStockSettings())
})
stockRouter.patch('/stock/settings', requireRole('manager'), async (req, res) => {
  res.json(await updateStockSettings(UpdateStockSettingsInputSchema.parse(req.body)))
})
