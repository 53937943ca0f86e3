import { queryOptions } from '@tanstack/react-query'
import { z } from 'zod'
import { CylinderStatusSchema } from '#shared/schemas/oxygen'
import { apiFetch } from '../../../lib/api-client'

export const oxygenKeys = {
  all: ['oxygen'] as const,
  cylinders: () => [...oxygenKeys.all, 'cylinders'] as const,
}

export const oxygenQueries = {
  cylinders: () => queryOptions({ queryKey: oxygenKeys.cylinders(), queryFn: () => apiFetch('/oxygen/cylinders', z.array(CylinderStatusSchema)) }),
}
