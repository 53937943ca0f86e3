import { z } from 'zod'
import { text } from '#shared/schemas/text'

export const API_ERROR_CODES = [
  'validation_failed',
  'unauthenticated',
  'forbidden',
  'not_found',
  'conflict',
  'payload_too_large',
  'unsupported_media_type',
  'rate_limited',
  'service_unavailable',
  'internal',
] as const

export const ApiErrorBodySchema = z.object({
  error: z.object({
    code: z.enum(API_ERROR_CODES),
    message: text(),
    fieldErrors: z.record(text(), z.array(text())).optional(),
    requestId: text().optional(),
    details: z.record(text(), z.unknown()).optional(),
  }),
})
export type ApiErrorBody = z.infer<typeof ApiErrorBodySchema>
export type ApiErrorCode = ApiErrorBody['error']['code']
