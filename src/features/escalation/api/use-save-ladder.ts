import { useMutation, useQueryClient } from '@tanstack/react-query'
import { LadderSchema, type LadderInput } from '#shared/schemas/ladder'
import { apiFetch, jsonBody } from '../../../lib/api-client'
import { escalationKeys } from './escalation-queries'

export function useSaveLadder() {
  const queryClient = useQueryClient()
  return useMutation({
    mutationFn: ({ id, input }: { id: number | null; input: LadderInput }) =>
      id === null
        ? apiFetch('/ladders', LadderSchema, { method: 'POST', ...jsonBody(input) })
        : apiFetch(`/ladders/${id}`, LadderSchema, { method: 'PUT', ...jsonBody(input) }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: escalationKeys.ladders() }),
  })
}
