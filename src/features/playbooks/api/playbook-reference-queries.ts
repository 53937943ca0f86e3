import { queryOptions } from '@tanstack/react-query'
import { z } from 'zod'
import { AreaSchema, BatchSchema, FacilitySchema, TankSchema } from '#shared/schemas/facility'
import { apiFetch } from '../../../lib/api-client'

// This feature's own copies of the catalogue reads: features do not import each other.
const root = ['playbook-references'] as const

export const playbookReferenceQueries = {
  facility: () => queryOptions({ queryKey: [...root, 'facility'], queryFn: () => apiFetch('/facility', FacilitySchema), staleTime: 5 * 60_000 }),
  areas: () => queryOptions({ queryKey: [...root, 'areas'], queryFn: () => apiFetch('/areas', z.array(AreaSchema)) }),
  tanks: () => queryOptions({ queryKey: [...root, 'tanks'], queryFn: () => apiFetch('/tanks', z.array(TankSchema)) }),
  batches: () => queryOptions({ queryKey: [...root, 'batches'], queryFn: () => apiFetch('/batches', z.array(BatchSchema)) }),
}
