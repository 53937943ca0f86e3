import { useMutation, useQueryClient } from '@tanstack/react-query'
import { CompletionResultSchema } from '#shared/schemas/completion'
import { taskKeys } from '../../../api/tasks/task-keys'
import { apiFetch, jsonBody } from '../../../lib/api-client'

export interface PaperCompletion {
  taskId: number
  completionId: string
  readings: Record<string, number>
  /** The time written on the paper sheet. */
  doneAt: string
  /** Who did the work on paper, when someone else types it in. */
  performedById: number
}

/** Types one task of a paper round sheet back in, with the paper's time and doer. */
export function useEnterPaperCompletion() {
  const queryClient = useQueryClient()
  return useMutation({
    mutationFn: ({ taskId, ...body }: PaperCompletion) =>
      apiFetch(`/tasks/${taskId}/completion`, CompletionResultSchema, { method: 'POST', ...jsonBody(body) }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: taskKeys.all }),
  })
}
