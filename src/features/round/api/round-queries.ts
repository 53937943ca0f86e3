import { queryOptions } from '@tanstack/react-query'
import { RoundSchema } from '#shared/schemas/round'
import { taskKeys } from '../../../api/tasks/task-keys'
import { apiFetch } from '../../../lib/api-client'

export const roundQueries = {
  day: (date: string | null) =>
    queryOptions({
      queryKey: taskKeys.round(date),
      queryFn: () => apiFetch(`/tasks/round${date ? `?date=${date}` : ''}`, RoundSchema),
      // The service worker may answer from its cache while the phone is offline, so let the request go out.
      networkMode: 'offlineFirst',
    }),
}
