import { Router } from 'express'
import multer from 'multer'
import { z } from 'zod'
import { AmendmentInputSchema, CompletionInputSchema } from '#shared/schemas/completion'
import { text } from '#shared/schemas/text'
import { IdParamSchema } from '#shared/schemas/facility'
import { PHOTO_CACHE_CONTROL } from '../../lib/cache-control'
import type { AppConfig } from '../../lib/config'
import { AppError } from '../../lib/errors'
import { requireRole, signedIn } from '../../lib/require-role'
import { takeTask } from '../tasks/take-task.service'
import { amendCompletion, completionHistory } from './amendments.service'
import { completeTask } from './completions.service'
import { PHOTO_MAX_BYTES, listPhotos, photoFile, savePhoto } from './photos.service'

const doers = requireRole('manager', 'supervisor', 'technician')

export function completionsRouter(config: AppConfig) {
  const router = Router()
  const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: PHOTO_MAX_BYTES, files: 1 } })

  router.post('/tasks/:id/completion', doers, async (req, res) => {
    const { id } = IdParamSchema.parse(req.params)
    res.json(await completeTask(id, req.user!, CompletionInputSchema.parse(req.body)))
  })

  router.get('/tasks/:id/completion', signedIn, async (req, res) => {
    res.json(await completionHistory(IdParamSchema.parse(req.params).id))
  })

  router.post('/completions/:completionId/amendments', doers, async (req, res) => {
    const { completionId } = z.object({ completionId: text().uuid() }).parse(req.params)
    res.status(201).json(await amendCompletion(completionId, req.user!, AmendmentInputSchema.parse(req.body)))
  })

  router.post('/tasks/:id/take', doers, async (req, res) => {
    res.json(await takeTask(IdParamSchema.parse(req.params).id, req.user!))
  })

  router.post('/tasks/:id/photos', doers, upload.single('photo'), async (req, res) => {
    const { id } = IdParamSchema.parse(req.params)
    if (!req.file) throw new AppError(400, 'validation_failed', 'Attach a photo in the "photo" field.', { fieldErrors: { photo: ['Required'] } })
    const photo = await savePhoto(config.uploadDir, id, req.user!, req.file)
    res.status(201).json({ id: photo.id, mimeType: photo.mimeType, sizeBytes: photo.sizeBytes })
  })

  router.get('/tasks/:id/photos', signedIn, async (req, res) => {
    const rows = await listPhotos(IdParamSchema.parse(req.params).id)
    res.json(rows.map((p) => ({ id: p.id, mimeType: p.mimeType, sizeBytes: p.sizeBytes, createdAt: p.createdAt.toISOString() })))
  })

  router.get('/photos/:photoId', signedIn, async (req, res) => {
    const { photoId } = z.object({ photoId: text().uuid() }).parse(req.params)
    const file = await photoFile(config.uploadDir, photoId)
    res.setHeader('cache-control', PHOTO_CACHE_CONTROL)
    res.type(file.mimeType).sendFile(file.path, { dotfiles: 'allow', cacheControl: false })
  })

  return router
}
