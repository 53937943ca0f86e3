import { useMutation, useQueryClient } from '@tanstack/react-query'
import { TaskSchema } from '#shared/schemas/task'
import { apiFetch } from '../../../lib/api-client'
import { upsertRoundTask } from './round-cache'

export function useTakeTask(personId: number) {
  const queryClient = useQueryClient()
  return useMutation({
    mutationFn: (taskId: number) => apiFetch(`/tasks/${taskId}/take`, TaskSchema, { method: 'POST' }),
    onSuccess: (task) => upsertRoundTask(queryClient, task, personId),
  })
}
