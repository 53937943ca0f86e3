import { Router, type Request, type Response, type NextFunction } from 'express'
import twilio from 'twilio'
import type { AppConfig } from '../../lib/config'
import { logger } from '../../lib/logger'
import { acknowledgeByTextReply, recordTextStatus } from './text-replies'

const REPLIES: Record<string, string> = {
  acknowledged: 'Acknowledged. Roundtide has stopped the escalation and recorded your answer.',
  already: 'Already answered; your reply is noted.',
  unknown: 'Roundtide did not recognise that code. Reply with the 4 digits from the alert, or open Roundtide.',
  inactive: 'This number belongs to an account that is no longer active; acknowledge in Roundtide.',
}

/**
 * The provider's webhooks (public: the provider has no session). Each request must carry a
 * valid X-Twilio-Signature over this server's public URL and the posted fields, checked with the
 * SDK's own `validateRequest` and the account's auth token; anything else is refused.
 */
export function textHooksRouter(config: AppConfig) {
  const router = Router()
  const verified = (req: Request, res: Response, next: NextFunction) => {
    const signature = req.header('x-twilio-signature') ?? ''
    const url = `${config.publicUrl}${req.originalUrl}`
    if (config.sms.authToken && twilio.validateRequest(config.sms.authToken, signature, url, (req.body ?? {}) as Record<string, string>)) return next()
    logger.warn({ url }, 'text webhook refused: bad signature')
    res.status(403).type('text/plain').send('Signature not valid')
  }

  router.post('/status', verified, async (req, res) => {
    const body = req.body as Record<string, string | undefined>
    if (body.MessageSid && body.MessageStatus) await recordTextStatus(body.MessageSid, body.MessageStatus, body.ErrorCode)
    res.status(204).end()
  })

  router.post('/inbound', verified, async (req, res) => {
    const body = req.body as Record<string, string | undefined>
    const outcome = await acknowledgeByTextReply(body.From ?? '', body.Body ?? '')
    const reply = new twilio.twiml.MessagingResponse()
    reply.message(REPLIES[outcome])
    res.type('text/xml').send(reply.toString())
  })
  return router
}
