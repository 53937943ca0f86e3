import type { QueryClient } from '@tanstack/react-query'
import type { CompletionResult } from '#shared/schemas/completion'
import type { Round } from '#shared/schemas/round'
import type { Task } from '#shared/schemas/task'
import { patchRound } from '../utils/patch-round'
import { fetchTask } from './completion-api'
import { roundKeys } from './round-queries'

/** Puts one changed task into every cached round; a round that cannot place it refetches once. */
export function upsertRoundTask(queryClient: QueryClient, task: Task, personId: number | null) {
  for (const [queryKey, round] of queryClient.getQueriesData<Round>({ queryKey: roundKeys.all })) {
    if (!round) continue
    const next = patchRound(round, task, personId)
    if (next === 'refetch') void queryClient.invalidateQueries({ queryKey, exact: true })
    else if (next !== round) queryClient.setQueryData(queryKey, next)
  }
}

const inSomeRound = (queryClient: QueryClient, taskId: number) =>
  queryClient.getQueriesData<Round>({ queryKey: roundKeys.all }).some(([, round]) => round?.tasks.some((t) => t.id === taskId))

/** A completion's answer replaces the task, and its recheck (if any) joins the round. */
export async function applyCompletionResult(queryClient: QueryClient, result: CompletionResult, personId: number) {
  upsertRoundTask(queryClient, result.task, personId)
  if (result.recheckTaskId && !inSomeRound(queryClient, result.recheckTaskId)) {
    // The socket event may bring it first; fetching too keeps a round without a live connection right.
    const recheck = await fetchTask(result.recheckTaskId).catch(() => null)
    if (recheck) upsertRoundTask(queryClient, recheck, personId)
  }
}
