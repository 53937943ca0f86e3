import { Router } from 'express'
import { IdParamSchema } from '#shared/schemas/facility'
import { LadderInputSchema, TextReplyInputSchema } from '#shared/schemas/ladder'
import { PreferencesInputSchema, PushSubscriptionInputSchema, PushUnsubscribeInputSchema } from '#shared/schemas/preferences'
import type { AppConfig } from '../../lib/config'
import { notFound } from '../../lib/errors'
import { requireRole, signedIn } from '../../lib/require-role'
import { passwordCheckLimiter } from '../auth/sign-in-limits'
import { myPreferences, updateMyPreferences } from './preferences.service'
import { registerPushSubscription, removePushSubscription } from './push-subscriptions.service'
import { localMail, localTexts, replyAsRecipient } from './text-outbox.service'
import { addStandInDevice, localPushes } from './push-outbox.service'
import { acknowledgeInApp, escalationRecord } from './escalation.service'
import { createLadder, listLadders, updateLadder } from './ladders.service'

export function escalationRouter(config: AppConfig) {
  const router = Router()

  router.get('/ladders', signedIn, async (_req, res) => {
    res.json(await listLadders())
  })
  router.post('/ladders', requireRole('manager'), async (req, res) => {
    res.status(201).json(await createLadder(LadderInputSchema.parse(req.body)))
  })
  router.put('/ladders/:id', requireRole('manager'), async (req, res) => {
    const { id } = IdParamSchema.parse(req.params)
    res.json(await updateLadder(id, LadderInputSchema.parse(req.body)))
  })

  router.get('/tasks/:id/escalations', signedIn, async (req, res) => {
    res.json(await escalationRecord(IdParamSchema.parse(req.params).id))
  })
  router.post('/alerts/:id/acknowledge', signedIn, async (req, res) => {
    await acknowledgeInApp(IdParamSchema.parse(req.params).id, req.user!)
    res.status(204).end()
  })

  router.get('/me/preferences', signedIn, async (req, res) => {
    res.json(await myPreferences(config, req.user!.id))
  })
  router.patch('/me/preferences', signedIn, passwordCheckLimiter(config), async (req, res) => {
    res.json(await updateMyPreferences(config, req.user!.id, PreferencesInputSchema.parse(req.body)))
  })

  // This device's push subscription (the settings page's "Send alerts to this device").
  router.get('/push/public-key', signedIn, (_req, res) => {
    if (!config.push.enabled || !config.push.vapid) throw notFound('Push alerts (turned off on this server)')
    res.json({ publicKey: config.push.vapid.publicKey })
  })
  router.post('/me/push-subscriptions', signedIn, async (req, res) => {
    await registerPushSubscription(req.user!.id, PushSubscriptionInputSchema.parse(req.body))
    res.status(204).end()
  })
  router.delete('/me/push-subscriptions', signedIn, async (req, res) => {
    await removePushSubscription(req.user!.id, PushUnsubscribeInputSchema.parse(req.body).endpoint)
    res.status(204).end()
  })

  // Local mode only: the mail the app sent, as the local SMTP server received it.
  router.get('/outbox', requireRole('manager'), async (_req, res) => {
    res.json(await localMail(config))
  })
  // Local text mode only: what the stand-in provider received, and a reply sent as the recipient.
  router.get('/outbox/texts', requireRole('manager'), async (_req, res) => {
    res.json(await localTexts(config))
  })
  router.post('/outbox/texts/:id/reply', requireRole('manager'), async (req, res) => {
    res.json(await replyAsRecipient(config, IdParamSchema.parse(req.params).id, TextReplyInputSchema.parse(req.body).body))
  })
  // Local push mode only: what the stand-in push service decrypted, and a stand-in device for me.
  router.get('/outbox/pushes', requireRole('manager'), async (_req, res) => {
    res.json(await localPushes(config))
  })
  router.post('/outbox/push-devices', requireRole('manager'), async (req, res) => {
    await addStandInDevice(config, req.user!.id)
    res.status(204).end()
  })

  return router
}
