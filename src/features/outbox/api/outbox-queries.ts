import { queryOptions } from '@tanstack/react-query'
import { z } from 'zod'
import { OutboxMessageSchema } from '#shared/schemas/ladder'
import { ApiError, apiFetch } from '../../../lib/api-client'

export const outboxKeys = {
  all: ['outbox'] as const,
  list: () => [...outboxKeys.all, 'list'] as const,
}

/** null when the server sends real mail (smtp mode), where there is no outbox to show. */
async function fetchOutbox() {
  try {
    return await apiFetch('/outbox', z.array(OutboxMessageSchema))
  } catch (error) {
    if (error instanceof ApiError && error.status === 404) return null
    throw error
  }
}

export const outboxQueries = {
  list: () => queryOptions({ queryKey: outboxKeys.list(), queryFn: fetchOutbox, staleTime: 5_000, refetchInterval: 10_000 }),
}
