import { useMutation, useQueryClient } from '@tanstack/react-query'
import { IncidentSchema, type FileIncidentInput, type Incident, type UpdateIncidentInput } from '#shared/schemas/incident'
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

/** Files an incident by hand; the answer goes into the cache so its record opens at once. The form shows refusals itself. */
export function useFileIncident() {
  const queryClient = useQueryClient()
  return useMutation({
    mutationFn: (input: FileIncidentInput) => post('/incidents', input),
    // Sent now or refused now: a form left pending offline would file it later without the person seeing it.
    networkMode: 'always',
    meta: { errorShownInline: true },
    onSuccess: (incident) => {
      queryClient.setQueryData(incidentKeys.detail(incident.id), incident)
      return queryClient.invalidateQueries({ queryKey: incidentKeys.list() })
    },
  })
}
