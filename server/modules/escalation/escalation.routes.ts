import { Router } from 'express'
import { IdParamSchema } from '#shared/schemas/facility'
import { db } from '../../db/data-source'
import type { AppConfig } from '../../lib/config'
import { notFound } from '../../lib/errors'
import { requireRole, signedIn } from '../auth/require-role'
import { OutboxEntity } from './escalation.entities'
import { acknowledgeInApp, escalationRecord } from './escalation.service'
import { createLadder, listLadders, updateLadder } from './ladders.service'

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

  // Local mode only: the mail the app sent, as the local SMTP server received it.
  router.get('/outbox', requireRole('manager'), async (_req, res) => {
    if (config.mail.mode !== 'local') throw notFound('The outbox (only in local mail mode)')
    const rows = await db().getRepository(OutboxEntity).find({ order: { id: 'DESC' }, take: 200 })
    res.json(rows.map((r) => ({ ...r, receivedAt: r.receivedAt.toISOString() })))
  })

  return router
}
