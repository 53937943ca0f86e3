import type { QueryClient } from '@tanstack/react-query'
import type { Round } from '#shared/schemas/round'
import type { Task } from '#shared/schemas/task'
import { patchRound } from './patch-round'
import { taskKeys } from './task-keys'

/** Puts one changed task into every cached round; a round that cannot place it refetches once. */
export function upsertRoundTask(queryClient: QueryClient, task: Task, personId: number | null) {
  for (const [queryKey, round] of queryClient.getQueriesData<Round>({ queryKey: taskKeys.rounds() })) {
    if (!round) continue
    const next = patchRound(round, task, personId)
    if (next === 'refetch') void queryClient.invalidateQueries({ queryKey, exact: true })
    else if (next !== round) queryClient.setQueryData(queryKey, next)
  }
}

export const inSomeRound = (queryClient: QueryClient, taskId: number) =>
  queryClient.getQueriesData<Round>({ queryKey: taskKeys.rounds() }).some(([, round]) => round?.tasks.some((t) => t.id === taskId))
