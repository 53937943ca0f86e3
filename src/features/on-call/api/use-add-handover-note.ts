import { useMutation, useQueryClient } from '@tanstack/react-query'
import { HandoverNoteSchema } from '#shared/schemas/roster'
import { apiFetch, jsonBody } from '../../../lib/api-client'
import { onCallKeys } from './on-call-queries'

export function useAddHandoverNote() {
  const queryClient = useQueryClient()
  return useMutation({
    mutationFn: (input: { text: string }) => apiFetch('/on-call/notes', HandoverNoteSchema, { method: 'POST', ...jsonBody(input) }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: onCallKeys.summary() }),
  })
}
