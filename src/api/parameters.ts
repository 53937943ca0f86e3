import { queryOptions } from '@tanstack/react-query'
import { z } from 'zod'
import { LimitSchema, ParameterSchema } from '#shared/schemas/parameter'
import { apiFetch } from '../lib/api-client'

export const parameterKeys = {
  parameters: ['parameters'] as const,
  limits: ['limits'] as const,
}

export const parameterQueries = {
  parameters: () =>
    queryOptions({ queryKey: parameterKeys.parameters, queryFn: () => apiFetch('/parameters', z.array(ParameterSchema)), staleTime: 5 * 60_000 }),
  limits: () => queryOptions({ queryKey: parameterKeys.limits, queryFn: () => apiFetch('/limits', z.array(LimitSchema)) }),
}
