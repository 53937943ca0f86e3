import type { QueryClient } from '@tanstack/react-query'
import type { Task } from '#shared/schemas/task'
import { patchBoardTask } from './board-cache'
import { upsertRoundTask } from './round-cache'
import { taskKeys } from './task-keys'
import { patchTaskLists } from './task-lists-cache'

/** One changed task (a live event or a mutation's answer) patched into every cached view of tasks. */
export function patchTaskViews(queryClient: QueryClient, task: Task, personId: number | null) {
  patchTaskLists(queryClient, task)
  upsertRoundTask(queryClient, task, personId)
  patchBoardTask(queryClient, task)
  const detail = queryClient.getQueryData<Task>(taskKeys.detail(task.id))
  if (detail && detail.version <= task.version) queryClient.setQueryData(taskKeys.detail(task.id), task)
}

/** Too much changed to patch (a reconnect, a bulk change): every task view refetches once. */
export const refetchTaskViews = (queryClient: QueryClient) => queryClient.invalidateQueries({ queryKey: taskKeys.all }, { cancelRefetch: false })
