import { queryOptions } from '@tanstack/react-query'
import { z } from 'zod'
import { FacilitySchema } from '#shared/schemas/facility'
import { LimitSchema, ParameterSchema } from '#shared/schemas/parameter'
import { ApiError, apiFetch } from '../../../lib/api-client'
import { itemSchema, type CatalogueName } from './catalogues'

export const facilityKeys = {
  all: ['facility'] as const,
  settings: () => [...facilityKeys.all, 'settings'] as const,
  catalogue: (name: CatalogueName) => [...facilityKeys.all, 'catalogue', name] as const,
  parameters: () => [...facilityKeys.all, 'parameters'] as const,
  limits: () => [...facilityKeys.all, 'limits'] as const,
}

// A fresh database has no facility row until the seed runs; the page still shows the catalogues.
async function fetchFacilityOrNull() {
  try {
    return await apiFetch('/facility', FacilitySchema)
  } catch (error) {
    if (error instanceof ApiError && error.status === 404) return null
    throw error
  }
}

const catalogue = <K extends CatalogueName>(name: K) =>
  queryOptions({ queryKey: facilityKeys.catalogue(name), queryFn: () => apiFetch(`/${name}`, z.array(itemSchema(name))) })

export const facilityQueries = {
  facility: () => queryOptions({ queryKey: facilityKeys.settings(), queryFn: fetchFacilityOrNull }),
  areas: () => catalogue('areas'),
  systems: () => catalogue('systems'),
  tanks: () => catalogue('tanks'),
  equipment: () => catalogue('equipment'),
  batches: () => catalogue('batches'),
  parameters: () =>
    queryOptions({ queryKey: facilityKeys.parameters(), queryFn: () => apiFetch('/parameters', z.array(ParameterSchema)), staleTime: 5 * 60_000 }),
  limits: () => queryOptions({ queryKey: facilityKeys.limits(), queryFn: () => apiFetch('/limits', z.array(LimitSchema)) }),
}
