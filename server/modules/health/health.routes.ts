import { Router } from 'express'
import { db } from '../../db/data-source'

export const healthRouter = Router()

healthRouter.get('/', async (_req, res) => {
  const started = Date.now()
  try {
    await Promise.race([db().query('SELECT 1'), new Promise((_, reject) => setTimeout(() => reject(new Error('timeout')), 2000))])
    res.json({ status: 'ok', database: 'up', latencyMs: Date.now() - started })
  } catch {
    res.status(503).json({ status: 'degraded', database: 'down', message: 'The database is not reachable.' })
  }
})
