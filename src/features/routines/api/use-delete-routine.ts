import { useMutation, useQueryClient } from '@tanstack/react-query'
import { z } from 'zod'
import { apiFetch } from '../../../lib/api-client'
import { routineKeys, routineTaskKeys } from './routine-queries'

export function useDeleteRoutine() {
  const queryClient = useQueryClient()
  return useMutation({
    mutationFn: (id: number) => apiFetch(`/routines/${id}`, z.null(), { method: 'DELETE' }),
    onSuccess: (_data, id) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: routineKeys.lists() }),
        queryClient.invalidateQueries({ queryKey: routineTaskKeys.lists() }),
        // Marked stale but not refetched: the page still showing it would only get a 404.
        queryClient.invalidateQueries({ queryKey: routineKeys.detail(id), refetchType: 'none' }),
      ]),
  })
}
