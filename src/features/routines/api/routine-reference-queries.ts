import { queryOptions } from '@tanstack/react-query'
import { z } from 'zod'
import {
  AreaSchema, BatchSchema, EquipmentSchema, FacilitySchema, SystemSchema, TankSchema,
} from '#shared/schemas/facility'
import { ParameterSchema } from '#shared/schemas/parameter'
import { PersonSchema } from '#shared/schemas/person'
import { apiFetch } from '../../../lib/api-client'

// The routine editor's own copies of the catalogue reads: features do not import each other,
// and a separate key root keeps these independent of how other features shape their caches.
const root = ['routine-references'] as const
const list = <T,>(name: string, path: string, schema: z.ZodType<T>) =>
  queryOptions({ queryKey: [...root, name], queryFn: () => apiFetch(path, z.array(schema)) })

export const routineReferenceQueries = {
  facility: () => queryOptions({ queryKey: [...root, 'facility'], queryFn: () => apiFetch('/facility', FacilitySchema) }),
  parameters: () => list('parameters', '/parameters', ParameterSchema),
  areas: () => list('areas', '/areas', AreaSchema),
  systems: () => list('systems', '/systems', SystemSchema),
  tanks: () => list('tanks', '/tanks', TankSchema),
  equipment: () => list('equipment', '/equipment', EquipmentSchema),
  batches: () => list('batches', '/batches', BatchSchema),
  /** Manager-only on the server. */
  people: () => list('people', '/people', PersonSchema),
}
