import { Router } from 'express'
import type { Request } from 'express'
import { PersonSchema, SignInInputSchema, type Person } from '#shared/schemas/person'
import type { AppConfig } from '../../lib/config'
import { unauthenticated } from '../../lib/errors'
import { disconnectSession } from '../../realtime/socket-server'
import { configurePassport } from './passport'
import { signedIn } from '../../lib/require-role'
import { signInLimiters } from './sign-in-limits'

const WRONG = 'That e-mail and password do not match an active account.'

function publicPerson(user: Express.User): Person {
  return PersonSchema.parse(user)
}

export function authRouter(config: AppConfig) {
  const router = Router()
  const passport = configurePassport()

  router.post('/session', ...signInLimiters(config), async (req, res) => {
    const input = SignInInputSchema.parse(req.body)
    req.body = input
    const user = await authenticate(req)
    if (!user) throw unauthenticated(WRONG)
    // Rotate the session id at sign-in so an id planted before sign-in is worthless.
    await new Promise<void>((resolve, reject) => req.session.regenerate((e) => (e ? reject(e) : resolve())))
    await new Promise<void>((resolve, reject) => req.logIn(user, (e) => (e ? reject(e) : resolve())))
    res.json(publicPerson(user))
  })

  router.delete('/session', async (req, res) => {
    const sessionId = req.sessionID
    await new Promise<void>((resolve, reject) => req.logout((e) => (e ? reject(e) : resolve())))
    await new Promise<void>((resolve) => req.session.destroy(() => resolve()))
    disconnectSession(sessionId)
    res.clearCookie('roundtide.sid')
    res.status(204).end()
  })

  router.get('/me', signedIn, (req, res) => {
    res.json(publicPerson(req.user!))
  })

  function authenticate(req: Request) {
    return new Promise<Express.User | false>((resolve, reject) => {
      passport.authenticate('local', { session: false }, (err: unknown, user: Express.User | false) => (err ? reject(err) : resolve(user)))(
        req,
        req.res!,
        () => undefined,
      )
    })
  }

  return router
}
