import { AsyncLocalStorage } from 'node:async_hooks'
import type { RequestHandler } from 'express'

interface RequestContext {
  personId: number | null
}

const storage = new AsyncLocalStorage<RequestContext>()

/** Carries who is acting through a request, so the audit trail can name them without threading it everywhere. */
export const requestContext: RequestHandler = (req, _res, next) => {
  storage.run({ personId: req.user?.id ?? null }, next)
}

export const currentPersonId = () => storage.getStore()?.personId ?? null
