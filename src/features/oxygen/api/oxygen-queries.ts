import { queryOptions } from '@tanstack/react-query'
import { z } from 'zod'
import { FacilitySchema } from '#shared/schemas/facility'
import { CylinderStatusSchema } from '#shared/schemas/oxygen'
import { apiFetch } from '../../../lib/api-client'

export const oxygenKeys = {
  all: ['oxygen'] as const,
  cylinders: () => [...oxygenKeys.all, 'cylinders'] as const,
  facility: () => [...oxygenKeys.all, 'facility'] as const,
}

export const oxygenQueries = {
  cylinders: () => queryOptions({ queryKey: oxygenKeys.cylinders(), queryFn: () => apiFetch('/oxygen/cylinders', z.array(CylinderStatusSchema)) }),
  facility: () => queryOptions({ queryKey: oxygenKeys.facility(), queryFn: () => apiFetch('/facility', FacilitySchema), staleTime: 5 * 60_000 }),
}
