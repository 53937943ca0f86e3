import { queryOptions } from '@tanstack/react-query'
import { FacilitySchema, type Facility } from '#shared/schemas/facility'
import { ApiError, apiFetch } from '../lib/api-client'

// One key for the facility everywhere: saving the settings updates every page that shows its clock.
export const facilityKeys = { all: ['facility'] as const }

// A fresh database has no facility row until the seed runs.
async function fetchFacilityOrNull() {
  try {
    return await apiFetch('/facility', FacilitySchema)
  } catch (error) {
    if (error instanceof ApiError && error.status === 404) return null
    throw error
  }
}

/** The facility's time zone, or the browser's while no facility is set up yet. */
export const facilityZone = (facility: Facility | null | undefined) => facility?.timeZone ?? Intl.DateTimeFormat().resolvedOptions().timeZone

/** For pages that cannot work without the facility's settings: the route's error panel says what to do. */
export function requireFacility(facility: Facility | null): Facility {
  if (!facility) throw new Error('This database has no facility record yet. Run the seed on the server (npm run seed), then reload.')
  return facility
}

const base = () => queryOptions({ queryKey: facilityKeys.all, queryFn: fetchFacilityOrNull, staleTime: 5 * 60_000 })

export const facilityQueries = {
  /** The settings, or null on a database without a facility. */
  facility: base,
  /** The settings, failing the page when there is no facility yet. */
  required: () => queryOptions({ ...base(), select: requireFacility }),
  timeZone: () => queryOptions({ ...base(), select: facilityZone }),
}
