import { useMutation, useQueryClient } from '@tanstack/react-query'
import { z } from 'zod'
import { apiFetch } from '../../../lib/api-client'
import { onCallKeys } from './on-call-queries'

export function useAcknowledgeAlert() {
  const queryClient = useQueryClient()
  return useMutation({
    mutationFn: (alertId: number) => apiFetch(`/alerts/${alertId}/acknowledge`, z.null(), { method: 'POST' }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: onCallKeys.summary() }),
  })
}
