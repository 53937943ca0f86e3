import { Router } from 'express'
import multer from 'multer'
import type { z } from 'zod'
import { IdParamSchema, UpdateFacilityInputSchema } from '#shared/schemas/facility'
import type { Role } from '#shared/schemas/person'
import { AppError } from '../../lib/errors'
import { requireRole, signedIn } from '../../lib/require-role'
import { areas, batches, equipment, systems, tanks } from './catalogues'
import { getFacility, updateFacility } from './facility.service'
import { importTanksCsv } from './tank-import.service'

export const facilityRouter = Router()

facilityRouter.get('/facility', signedIn, async (_req, res) => {
  res.json(await getFacility())
})
facilityRouter.patch('/facility', requireRole('manager'), async (req, res) => {
  res.json(await updateFacility(UpdateFacilityInputSchema.parse(req.body)))
})

/** What a catalogue offers the routes: its functions and the shapes its input is parsed with. */
interface MountedCatalogue<New, Change> {
  createSchema: z.ZodType<New>
  updateSchema: z.ZodType<Change>
  list(): Promise<unknown>
  get(id: number): Promise<unknown>
  create(data: New): Promise<unknown>
  update(id: number, data: Change): Promise<unknown>
  remove(id: number): Promise<void>
}

function mount<New, Change>(path: string, c: MountedCatalogue<New, Change>, editors: Role[]) {
  facilityRouter.get(path, signedIn, async (_req, res) => {
    res.json(await c.list())
  })
  facilityRouter.get(`${path}/:id`, signedIn, async (req, res) => {
    res.json(await c.get(IdParamSchema.parse(req.params).id))
  })
  facilityRouter.post(path, requireRole(...editors), async (req, res) => {
    res.status(201).json(await c.create(c.createSchema.parse(req.body)))
  })
  facilityRouter.patch(`${path}/:id`, requireRole(...editors), async (req, res) => {
    const { id } = IdParamSchema.parse(req.params)
    res.json(await c.update(id, c.updateSchema.parse(req.body)))
  })
  facilityRouter.delete(`${path}/:id`, requireRole(...editors), async (req, res) => {
    await c.remove(IdParamSchema.parse(req.params).id)
    res.status(204).end()
  })
}

const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: 1024 * 1024, files: 1 } })

// Registered before the generic routes so "/tanks/import" is not read as "/tanks/:id".
facilityRouter.post('/tanks/import', requireRole('manager'), upload.single('file'), async (req, res) => {
  if (!req.file) throw new AppError(400, 'validation_failed', 'Attach a CSV file in the "file" field.', { fieldErrors: { file: ['Required'] } })
  if (!/csv|text\/plain|application\/vnd\.ms-excel/.test(req.file.mimetype) && !req.file.originalname.toLowerCase().endsWith('.csv')) {
    throw new AppError(415, 'unsupported_media_type', 'Tanks can only be imported from a CSV file.')
  }
  res.json(await importTanksCsv(req.file.buffer.toString('utf8')))
})

mount('/areas', areas, ['manager'])
mount('/systems', systems, ['manager'])
mount('/tanks', tanks, ['manager'])
mount('/equipment', equipment, ['manager'])
mount('/batches', batches, ['manager', 'supervisor'])
