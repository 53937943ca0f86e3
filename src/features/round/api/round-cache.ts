import type { QueryClient } from '@tanstack/react-query'
import type { CompletionResult } from '#shared/schemas/completion'
import { stockKeys } from '../../../api/stock'
import { inSomeRound, upsertRoundTask } from '../../../api/tasks/round-cache'
import { fetchTask } from './completion-api'

/** A completion's answer replaces the task, and its recheck (if any) joins the round; dead fish change the register's counts. */
export async function applyCompletionResult(queryClient: QueryClient, result: CompletionResult, personId: number) {
  upsertRoundTask(queryClient, result.task, personId)
  void queryClient.invalidateQueries({ queryKey: stockKeys.all })
  if (result.recheckTaskId && !inSomeRound(queryClient, result.recheckTaskId)) {
    // The socket event may bring it first; fetching too keeps a round without a live connection right.
    const recheck = await fetchTask(result.recheckTaskId).catch(() => null)
    if (recheck) upsertRoundTask(queryClient, recheck, personId)
  }
}
