import { queryOptions } from '@tanstack/react-query'
import { PersonSchema } from '#shared/schemas/person'
import { apiFetch } from '../../../lib/api-client'

export const authKeys = { me: ['me'] as const }

export const authQueries = {
  me: () => queryOptions({ queryKey: authKeys.me, queryFn: () => apiFetch('/me', PersonSchema), staleTime: 5 * 60_000 }),
}
