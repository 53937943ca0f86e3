import { Router } from 'express'
import type { AppConfig } from '../../lib/config'
import { acknowledgeByToken, type AckOutcome } from './escalation.service'

const page = (title: string, body: string) =>
  `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width,initial-scale=1"><title>${title} · Roundtide</title>
<style>body{font-family:system-ui,sans-serif;background:#eef6f8;color:#0b1d26;margin:0;padding:24px}main{max-width:28rem;margin:10vh auto;background:#fff;border-radius:16px;padding:24px}
button{min-height:48px;padding:0 20px;font-size:1rem;font-weight:600;border:0;border-radius:10px;background:#214e60;color:#fff}a{color:#214e60}</style></head><body><main>${body}</main></body></html>`

/** Where the answered alert is about: its task, or the incident when a hand-filed incident's alert has none. */
const subjectLink = (outcome: AckOutcome) =>
  outcome.taskId
    ? `<p><a href="/tasks/${outcome.taskId}">Open the task</a></p>`
    : outcome.incidentId
      ? `<p><a href="/incidents/${outcome.incidentId}">Open the incident</a></p>`
      : ''

const MESSAGES: Record<string, [string, string]> = {
  acknowledged: ['Acknowledged', 'Thank you. The escalation has stopped and your answer is on the record.'],
  already: ['Already answered', 'Someone had already acknowledged this; your answer is noted.'],
  used: ['Link already used', 'This acknowledge link was used before. Open the task in Roundtide to see who answered.'],
  expired: ['Link expired', 'This acknowledge link has expired. Open Roundtide to acknowledge from the task.'],
  forged: ['Link not valid', 'This acknowledge link is not valid.'],
  inactive: [
    'Account not active',
    'This link belongs to an account that is no longer active, so it cannot acknowledge. Open Roundtide and acknowledge from the task.',
  ],
}

/**
 * The link in an escalation mail. GET only shows a button (mail scanners follow links);
 * the POST from that button records the answer.
 */
export function ackRouter(config: AppConfig) {
  const router = Router()
  // With helmet's default no-referrer, browsers send `Origin: null` on the form post below,
  // which the same-origin check must refuse; same-origin keeps the real origin on it.
  router.use((_req, res, next) => {
    res.setHeader('Referrer-Policy', 'same-origin')
    next()
  })
  router.get('/:token', (_req, res) => {
    res.type('html').send(
      page(
        'Acknowledge',
        `<h1>Acknowledge this escalation?</h1><p>This tells Roundtide you are dealing with it and stops further messages.</p>
<form method="post"><button type="submit">Acknowledge</button></form>`,
      ),
    )
  })
  router.post('/:token', async (req, res) => {
    const outcome = await acknowledgeByToken(config.ackSecret, req.params.token)
    const [title, text] = MESSAGES[outcome.status]
    const ok = outcome.status === 'acknowledged' || outcome.status === 'already'
    res.status(ok ? 200 : outcome.status === 'used' ? 409 : outcome.status === 'inactive' ? 403 : 400)
    // The push notification's Acknowledge action (service worker) asks for JSON; the same single-use claim applies.
    if (req.accepts(['html', 'json']) === 'json')
      return void res.json({ status: outcome.status, title, message: text, taskId: outcome.taskId ?? null, incidentId: outcome.incidentId ?? null })
    res.type('html').send(page(title, `<h1>${title}</h1><p>${text}</p>${subjectLink(outcome)}`))
  })
  return router
}
