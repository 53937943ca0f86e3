import { CompletionResultSchema, type CompletionInput } from '#shared/schemas/completion'
import { TaskSchema } from '#shared/schemas/task'
import { ApiError, apiFetch, jsonBody } from '../../../lib/api-client'

export type CompletionPayload = CompletionInput & { completionId: string }

export const postCompletion = (taskId: number, input: CompletionPayload) =>
  apiFetch(`/tasks/${taskId}/completion`, CompletionResultSchema, { method: 'POST', ...jsonBody(input) })

export const fetchTask = (taskId: number) => apiFetch(`/tasks/${taskId}`, TaskSchema)

/** Worth trying again later: no connection, a gateway or server that is down for a moment, or a rate limit. */
export function isTransient(error: unknown): boolean {
  if (!(error instanceof ApiError)) return false
  return error.code === 'network' || [401, 408, 429, 502, 503, 504].includes(error.status)
}
