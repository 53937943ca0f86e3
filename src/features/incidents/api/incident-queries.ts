import { queryOptions } from '@tanstack/react-query'
import { z } from 'zod'
import { IncidentSchema } from '#shared/schemas/incident'
import { apiFetch } from '../../../lib/api-client'

export const incidentKeys = {
  all: ['incidents'] as const,
  list: () => [...incidentKeys.all, 'list'] as const,
  detail: (id: number) => [...incidentKeys.all, 'detail', id] as const,
}

export const incidentQueries = {
  // Proposals come from the status clock, not from this page: a list left open looks again each minute.
  list: () => queryOptions({ queryKey: incidentKeys.list(), queryFn: () => apiFetch('/incidents', z.array(IncidentSchema)), refetchInterval: 60_000 }),
  detail: (id: number) => queryOptions({ queryKey: incidentKeys.detail(id), queryFn: () => apiFetch(`/incidents/${id}`, IncidentSchema) }),
}
