import type { z } from 'zod'
import { ApiErrorBodySchema, type ApiErrorCode } from '#shared/api-error'

export class ApiError extends Error {
  readonly status: number
  readonly code: ApiErrorCode | 'network'
  readonly fieldErrors?: Record<string, string[]>
  readonly requestId?: string
  readonly details?: Record<string, unknown>

  constructor(status: number, code: ApiError['code'], message: string, extra: Partial<ApiError> = {}) {
    super(message)
    this.status = status
    this.code = code
    this.fieldErrors = extra.fieldErrors
    this.requestId = extra.requestId
    this.details = extra.details
  }

  static from(status: number, body: unknown): ApiError {
    const parsed = ApiErrorBodySchema.safeParse(body)
    if (parsed.success) {
      const e = parsed.data.error
      return new ApiError(status, e.code, e.message, e)
    }
    return new ApiError(status, status >= 500 ? 'internal' : 'validation_failed', `The server answered ${status}.`)
  }
}

/** The only place the client calls fetch: JSON in, schema-checked JSON out, ApiError on failure. */
export async function apiFetch<T>(path: string, schema: z.ZodType<T>, init: RequestInit = {}): Promise<T> {
  let res: Response
  try {
    res = await fetch(`/api${path}`, {
      credentials: 'same-origin',
      ...init,
      headers: init.body instanceof FormData ? init.headers : { 'content-type': 'application/json', ...init.headers },
    })
  } catch {
    throw new ApiError(0, 'network', 'No connection to Roundtide. Check the network and try again.')
  }
  const body: unknown = res.status === 204 ? null : await res.json().catch(() => null)
  if (!res.ok) throw ApiError.from(res.status, body)
  return schema.parse(body)
}

export const jsonBody = (value: unknown): RequestInit => ({ body: JSON.stringify(value) })
