import { Router } from 'express'
import { z } from 'zod'
import { IdParamSchema } from '#shared/schemas/facility'
import { db } from '../../db/data-source'
import type { AppConfig } from '../../lib/config'
import { notFound } from '../../lib/errors'
import { requireRole, signedIn } from '../auth/require-role'
import { PersonEntity } from '../people/person.entity'
import { OutboxEntity } from './escalation.entities'
import { acknowledgeInApp, escalationRecord } from './escalation.service'
import { createLadder, listLadders, updateLadder } from './ladders.service'

const hhmm = z.string().regex(/^([01]\d|2[0-3]):[0-5]\d$/, 'Use HH:MM, 24-hour').nullable()
export const PreferencesInputSchema = z
  .object({ email: z.string().trim().toLowerCase().email('Enter a valid e-mail address').optional(), quietStart: hhmm.optional(), quietEnd: hhmm.optional() })
  .refine((p) => (p.quietStart === undefined) === (p.quietEnd === undefined) && (p.quietStart === null) === (p.quietEnd === null), { path: ['quietEnd'], message: 'Give both the start and the end of quiet hours, or neither' })

export function escalationRouter(config: AppConfig) {
  const router = Router()

  router.get('/ladders', signedIn, async (_req, res) => {
    res.json(await listLadders())
  })
  router.post('/ladders', requireRole('manager'), async (req, res) => {
    res.status(201).json(await createLadder(req.body))
  })
  router.put('/ladders/:id', requireRole('manager'), async (req, res) => {
    res.json(await updateLadder(IdParamSchema.parse(req.params).id, req.body))
  })

  router.get('/tasks/:id/escalations', signedIn, async (req, res) => {
    res.json(await escalationRecord(IdParamSchema.parse(req.params).id))
  })
  router.post('/alerts/:id/acknowledge', signedIn, async (req, res) => {
    await acknowledgeInApp(IdParamSchema.parse(req.params).id, req.user!)
    res.status(204).end()
  })

  router.get('/me/preferences', signedIn, async (req, res) => {
    const row = await db().getRepository(PersonEntity).findOneByOrFail({ id: req.user!.id })
    res.json({ email: row.email, quietStart: row.quietStart, quietEnd: row.quietEnd })
  })
  router.patch('/me/preferences', signedIn, async (req, res) => {
    const input = PreferencesInputSchema.parse(req.body)
    await db().getRepository(PersonEntity).update(req.user!.id, input)
    const row = await db().getRepository(PersonEntity).findOneByOrFail({ id: req.user!.id })
    res.json({ email: row.email, quietStart: row.quietStart, quietEnd: row.quietEnd })
  })

  // Local mode only: the mail the app sent, as the local SMTP server received it.
  router.get('/outbox', requireRole('manager'), async (_req, res) => {
    if (config.mail.mode !== 'local') throw notFound('The outbox (only in local mail mode)')
    const rows = await db().getRepository(OutboxEntity).find({ order: { id: 'DESC' }, take: 200 })
    res.json(rows.map((r) => ({ ...r, receivedAt: r.receivedAt.toISOString() })))
  })

  return router
}
