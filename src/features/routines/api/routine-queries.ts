import { queryOptions } from '@tanstack/react-query'
import { z } from 'zod'
import { RoutineSchema } from '#shared/schemas/routine'
import { TaskSchema } from '#shared/schemas/task'
import { apiFetch } from '../../../lib/api-client'

export const routineKeys = {
  all: ['routines'] as const,
  lists: () => [...routineKeys.all, 'list'] as const,
  detail: (id: number) => [...routineKeys.all, 'detail', id] as const,
}

// Under the shared "tasks" root, so anything that invalidates tasks refreshes these too.
export const routineTaskKeys = {
  lists: () => ['tasks', 'list'] as const,
  upcoming: (routineId: number, from: string, to: string) => [...routineTaskKeys.lists(), { routineId, from, to }] as const,
}

export const routineQueries = {
  list: () => queryOptions({ queryKey: routineKeys.lists(), queryFn: () => apiFetch('/routines', z.array(RoutineSchema)) }),
  detail: (id: number) =>
    queryOptions({ queryKey: routineKeys.detail(id), queryFn: () => apiFetch(`/routines/${id}`, RoutineSchema) }),
  upcomingTasks: (routineId: number, from: string, to: string) =>
    queryOptions({
      queryKey: routineTaskKeys.upcoming(routineId, from, to),
      queryFn: () =>
        apiFetch(`/tasks?${new URLSearchParams({ routineId: String(routineId), from, to })}`, z.array(TaskSchema)),
    }),
}
