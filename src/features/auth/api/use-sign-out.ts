import { useMutation, useQueryClient } from '@tanstack/react-query'
import { z } from 'zod'
import { apiFetch } from '../../../lib/api-client'

export function useSignOut() {
  const queryClient = useQueryClient()
  return useMutation({
    mutationFn: () => apiFetch('/session', z.null(), { method: 'DELETE' }),
    onSuccess: () => queryClient.clear(),
  })
}
