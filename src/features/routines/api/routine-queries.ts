import { queryOptions } from '@tanstack/react-query'
import { z } from 'zod'
import { RoutineSchema } from '#shared/schemas/routine'
import { TaskSchema } from '#shared/schemas/task'
import { taskKeys } from '../../../api/tasks/task-keys'
import { apiFetch } from '../../../lib/api-client'

export const routineKeys = {
  all: ['routines'] as const,
  lists: () => [...routineKeys.all, 'list'] as const,
  detail: (id: number) => [...routineKeys.all, 'detail', id] as const,
}

export const routineQueries = {
  list: () => queryOptions({ queryKey: routineKeys.lists(), queryFn: () => apiFetch('/routines', z.array(RoutineSchema)) }),
  detail: (id: number) => queryOptions({ queryKey: routineKeys.detail(id), queryFn: () => apiFetch(`/routines/${id}`, RoutineSchema) }),
  upcomingTasks: (routineId: number, from: string, to: string) =>
    queryOptions({
      queryKey: taskKeys.list({ routineId, from, to }),
      queryFn: () => apiFetch(`/tasks?${new URLSearchParams({ routineId: String(routineId), from, to })}`, z.array(TaskSchema)),
    }),
}
