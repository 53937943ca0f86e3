import { useMutation, useQueryClient } from '@tanstack/react-query'
import { EventSchema, type EventInput, type FacilityEvent } from '#shared/schemas/playbook'
import { taskKeys } from '../../../api/tasks/task-keys'
import { apiFetch, jsonBody } from '../../../lib/api-client'
import { eventKeys } from './playbook-queries'

/** Events create, move and release tasks, so every change refreshes the events and the task views. */
function useRefreshAfterEvent() {
  const queryClient = useQueryClient()
  return (event: FacilityEvent) => {
    queryClient.setQueryData(eventKeys.detail(event.id), event)
    return Promise.all([queryClient.invalidateQueries({ queryKey: eventKeys.lists() }), queryClient.invalidateQueries({ queryKey: taskKeys.all })])
  }
}

export function useStartEvent() {
  const onSuccess = useRefreshAfterEvent()
  return useMutation({
    mutationFn: (input: EventInput) => apiFetch('/events', EventSchema, { method: 'POST', ...jsonBody(input) }),
    onSuccess,
  })
}

export function useFinishEvent() {
  const onSuccess = useRefreshAfterEvent()
  return useMutation({
    mutationFn: ({ id, action }: { id: number; action: 'cancel' | 'end' }) => apiFetch(`/events/${id}/${action}`, EventSchema, { method: 'POST' }),
    onSuccess,
  })
}
