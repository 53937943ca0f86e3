import { useMutation, useQueryClient } from '@tanstack/react-query'
import { z } from 'zod'
import { taskKeys } from '../../../api/tasks/task-keys'
import { apiFetch } from '../../../lib/api-client'
import { routineKeys } from './routine-queries'

export function useDeleteRoutine() {
  const queryClient = useQueryClient()
  return useMutation({
    mutationFn: (id: number) => apiFetch(`/routines/${id}`, z.null(), { method: 'DELETE' }),
    onSuccess: (_data, id) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: routineKeys.lists() }),
        queryClient.invalidateQueries({ queryKey: taskKeys.lists() }),
        // Marked stale but not refetched: the page still showing it would only get a 404.
        queryClient.invalidateQueries({ queryKey: routineKeys.detail(id), refetchType: 'none' }),
      ]),
  })
}
