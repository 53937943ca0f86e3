import { useMutation, useQueryClient } from '@tanstack/react-query'
import { z } from 'zod'
import { apiFetch } from '../../../lib/api-client'
import { escalationKeys } from './escalation-queries'

export function useAcknowledge(taskId: number) {
  const queryClient = useQueryClient()
  return useMutation({
    mutationFn: (alertId: number) => apiFetch(`/alerts/${alertId}/acknowledge`, z.null(), { method: 'POST' }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: escalationKeys.record(taskId) }),
  })
}
