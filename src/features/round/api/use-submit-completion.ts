import { useMutation, useQueryClient } from '@tanstack/react-query'
import type { CompletionResult } from '#shared/schemas/completion'
import type { RoundTask } from '#shared/schemas/round'
import { addToOutbox, loadOutbox } from '../outbox/outbox-store'
import { flushOutbox, waitingEntries } from '../outbox/outbox-sender'
import { rememberResult } from '../state/result-store'
import { isTransient, postCompletion, type CompletionPayload } from './completion-api'
import { applyCompletionResult } from './round-cache'

export type SubmitOutcome = { kind: 'sent'; result: CompletionResult } | { kind: 'queued' }

/**
 * Sends a completion, or keeps it in the phone's outbox when the server cannot be reached.
 * Anything already waiting goes first, so completions reach the server in the order they were made.
 */
export function useSubmitCompletion(personId: number) {
  const queryClient = useQueryClient()
  return useMutation({
    // It decides itself what to do offline (queue it); TanStack's default would pause it instead.
    networkMode: 'always',
    mutationFn: async ({ task, payload }: { task: RoundTask; payload: CompletionPayload }): Promise<SubmitOutcome> => {
      const queue = () =>
        addToOutbox({
          completionId: payload.completionId,
          taskId: task.id,
          personId,
          taskTitle: task.title,
          targetLabel: task.targetLabel,
          input: payload,
          queuedAt: Date.now(),
          failure: null,
        })
      await loadOutbox()
      if (!navigator.onLine || waitingEntries(personId).length > 0) {
        await queue()
        void flushOutbox()
        return { kind: 'queued' }
      }
      try {
        const result = await postCompletion(task.id, payload)
        rememberResult(task.id, result)
        await applyCompletionResult(queryClient, result, personId)
        return { kind: 'sent', result }
      } catch (error) {
        if (!isTransient(error)) throw error
        await queue()
        void flushOutbox()
        return { kind: 'queued' }
      }
    },
  })
}
