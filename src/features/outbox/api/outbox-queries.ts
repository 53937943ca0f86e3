import { queryOptions } from '@tanstack/react-query'
import { z } from 'zod'
import { OutboxMessageSchema, PushOutboxMessageSchema, TextOutboxMessageSchema } from '#shared/schemas/ladder'
import { ApiError, apiFetch } from '../../../lib/api-client'

export const outboxKeys = {
  all: ['outbox'] as const,
  list: () => [...outboxKeys.all, 'list'] as const,
  texts: () => [...outboxKeys.all, 'texts'] as const,
  pushes: () => [...outboxKeys.all, 'pushes'] as const,
}

/** null when the server sends for real (smtp or provider mode), where there is no outbox to show. */
async function fetchLocalOnly<T>(path: string, schema: z.ZodType<T>) {
  try {
    return await apiFetch(path, schema)
  } catch (error) {
    if (error instanceof ApiError && error.status === 404) return null
    throw error
  }
}

export const outboxQueries = {
  list: () =>
    queryOptions({
      queryKey: outboxKeys.list(),
      queryFn: () => fetchLocalOnly('/outbox', z.array(OutboxMessageSchema)),
      staleTime: 5_000,
      refetchInterval: 10_000,
    }),
  texts: () =>
    queryOptions({
      queryKey: outboxKeys.texts(),
      queryFn: () => fetchLocalOnly('/outbox/texts', z.array(TextOutboxMessageSchema)),
      staleTime: 5_000,
      refetchInterval: 10_000,
    }),
  pushes: () =>
    queryOptions({
      queryKey: outboxKeys.pushes(),
      queryFn: () => fetchLocalOnly('/outbox/pushes', z.array(PushOutboxMessageSchema)),
      staleTime: 5_000,
      refetchInterval: 10_000,
    }),
}
