import { useMutation, useQueryClient } from '@tanstack/react-query'
import { TaskSchema } from '#shared/schemas/task'
import { patchTaskViews } from '../../../api/tasks/task-cache'
import { apiFetch } from '../../../lib/api-client'

export function useTakeTask(personId: number) {
  const queryClient = useQueryClient()
  return useMutation({
    mutationFn: (taskId: number) => apiFetch(`/tasks/${taskId}/take`, TaskSchema, { method: 'POST' }),
    onSuccess: (task) => patchTaskViews(queryClient, task, personId),
  })
}
