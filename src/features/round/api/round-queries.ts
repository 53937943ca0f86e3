import { queryOptions } from '@tanstack/react-query'
import { RoundSchema } from '#shared/schemas/round'
import { apiFetch } from '../../../lib/api-client'

// Under the shared "tasks" root, so anything that invalidates tasks (e.g. a reconnect) refreshes the round too.
export const roundKeys = {
  all: ['tasks', 'round'] as const,
  day: (date: string | null) => [...roundKeys.all, date ?? 'today'] as const,
}

export const roundQueries = {
  day: (date: string | null) =>
    queryOptions({
      queryKey: roundKeys.day(date),
      queryFn: () => apiFetch(`/tasks/round${date ? `?date=${date}` : ''}`, RoundSchema),
      // The service worker may answer from its cache while the phone is offline, so let the request go out.
      networkMode: 'offlineFirst',
    }),
}
