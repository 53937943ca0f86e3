import { useMutation, useQueryClient } from '@tanstack/react-query'
import { IncidentSchema, type Incident, type UpdateIncidentInput } from '#shared/schemas/incident'
import { apiFetch, jsonBody } from '../../../lib/api-client'
import { incidentKeys } from './incident-queries'

/** Every change answers the whole incident: it replaces the record at once and the list is read again. */
function useIncidentChange<V>(id: number, request: (v: V) => Promise<Incident>) {
  const queryClient = useQueryClient()
  return useMutation({
    mutationFn: request,
    onSuccess: (incident) => {
      queryClient.setQueryData(incidentKeys.detail(id), incident)
      return queryClient.invalidateQueries({ queryKey: incidentKeys.list() })
    },
  })
}

const post = (path: string, body: unknown) => apiFetch(path, IncidentSchema, { method: 'POST', ...jsonBody(body) })

export const useDecideIncident = (id: number) =>
  useIncidentChange(id, ({ decision, reason }: { decision: 'confirm' | 'dismiss'; reason: string }) => post(`/incidents/${id}/${decision}`, { reason }))

export const useAddIncidentNote = (id: number) => useIncidentChange(id, (text: string) => post(`/incidents/${id}/notes`, { text }))

export const useUpdateIncident = (id: number) =>
  useIncidentChange(id, (input: UpdateIncidentInput) => apiFetch(`/incidents/${id}`, IncidentSchema, { method: 'PATCH', ...jsonBody(input) }))
