import type { ApiErrorCode } from '#shared/api-error'

export class AppError extends Error {
  readonly status: number
  readonly code: ApiErrorCode
  readonly fieldErrors?: Record<string, string[]>
  readonly details?: Record<string, unknown>

  constructor(status: number, code: ApiErrorCode, message: string, extra: { fieldErrors?: Record<string, string[]>; details?: Record<string, unknown> } = {}) {
    super(message)
    this.status = status
    this.code = code
    this.fieldErrors = extra.fieldErrors
    this.details = extra.details
  }
}

export const validationError = (message: string, fieldErrors: Record<string, string[]>) => new AppError(400, 'validation_failed', message, { fieldErrors })
export const unauthenticated = (message = 'Please sign in first.') => new AppError(401, 'unauthenticated', message)
export const forbidden = (message: string) => new AppError(403, 'forbidden', message)
export const notFound = (what: string) => new AppError(404, 'not_found', `${what} was not found.`)
export const conflict = (message: string, details?: Record<string, unknown>) => new AppError(409, 'conflict', message, { details })
