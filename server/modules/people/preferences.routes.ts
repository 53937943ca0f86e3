import { Router } from 'express'
import type { AppConfig } from '../../lib/config'
import { signedIn } from '../auth/require-role'
import { passwordCheckLimiter } from '../auth/sign-in-limits'
import { getPreferences, updatePreferences } from './preferences.service'

/** /api/me/preferences: every signed-in person's own address and quiet hours. */
export function preferencesRouter(config: AppConfig) {
  const router = Router()
  router.get('/', signedIn, async (req, res) => {
    res.json(await getPreferences(req.user!.id))
  })
  router.patch('/', signedIn, passwordCheckLimiter(config), async (req, res) => {
    res.json(await updatePreferences(req.user!.id, req.body))
  })
  return router
}
