import type { ErrorRequestHandler } from 'express'
import { ZodError, z } from 'zod'
import { AppError } from './errors'
import { isDatabaseDown } from '../db/database-errors'
import { duplicateKeyConflict, foreignKeyConflict } from '../db/unique-conflicts'
import { logger } from './logger'

type BodyParserError = Error & { type?: string; status?: number }

export const errorHandler: ErrorRequestHandler = (err: unknown, req, res, _next) => {
  void _next
  const requestId = String(req.id ?? '')
  if (err instanceof ZodError) {
    const flat = z.flattenError(err)
    const fieldErrors: Record<string, string[]> = {}
    for (const issue of err.issues) {
      const key = issue.path.length ? issue.path.join('.') : '_'
      ;(fieldErrors[key] ??= []).push(issue.message)
    }
    const first = flat.formErrors[0] ?? err.issues[0]?.message ?? 'Invalid input'
    res.status(400).json({ error: { code: 'validation_failed', message: `Please check the input: ${first}`, fieldErrors } })
    return
  }
  const known = err instanceof AppError ? err : (duplicateKeyConflict(err) ?? foreignKeyConflict(err))
  if (known) {
    res.status(known.status).json({
      error: { code: known.code, message: known.message, fieldErrors: known.fieldErrors, details: known.details },
    })
    return
  }
  const multerCode = (err as { name?: string; code?: string })?.name === 'MulterError' ? (err as { code: string }).code : null
  if (multerCode === 'LIMIT_FILE_SIZE') {
    res.status(413).json({ error: { code: 'payload_too_large', message: 'That file is too large.' } })
    return
  }
  if (multerCode) {
    res.status(400).json({ error: { code: 'validation_failed', message: `The upload was refused (${multerCode}).` } })
    return
  }
  const bodyErr = err as BodyParserError
  if (bodyErr?.type === 'entity.parse.failed') {
    res.status(400).json({ error: { code: 'validation_failed', message: 'The request body is not valid JSON.' } })
    return
  }
  if (bodyErr?.type === 'entity.too.large') {
    res.status(413).json({ error: { code: 'payload_too_large', message: 'The request body is too large.' } })
    return
  }
  if (isDatabaseDown(err)) {
    res.status(503).json({
      error: { code: 'service_unavailable', message: 'The database is not reachable just now. Please try again in a moment.', requestId },
    })
    return
  }
  logger.error({ err, requestId }, 'unhandled error')
  res.status(500).json({ error: { code: 'internal', message: 'Something went wrong on our side.', requestId } })
}
