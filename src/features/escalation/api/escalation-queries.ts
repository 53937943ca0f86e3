import { queryOptions } from '@tanstack/react-query'
import { z } from 'zod'
import { EscalationRecordSchema, LadderSchema } from '#shared/schemas/ladder'
import { PreferencesSchema } from '#shared/schemas/person'
import { TaskSchema } from '#shared/schemas/task'
import { taskKeys } from '../../../api/tasks/task-keys'
import { apiFetch } from '../../../lib/api-client'


export const escalationKeys = {
  all: ['escalation'] as const,
  record: (taskId: number) => [...escalationKeys.all, 'record', taskId] as const,
  ladders: () => [...escalationKeys.all, 'ladders'] as const,
  preferences: () => [...escalationKeys.all, 'preferences'] as const,
}

export const escalationQueries = {
  task: (id: number) => queryOptions({ queryKey: taskKeys.detail(id), queryFn: () => apiFetch(`/tasks/${id}`, TaskSchema) }),
  // A ladder climbs and mail goes out while the page is open: poll while someone watches it.
  record: (taskId: number) =>
    queryOptions({
      queryKey: escalationKeys.record(taskId),
      queryFn: () => apiFetch(`/tasks/${taskId}/escalations`, z.array(EscalationRecordSchema)),
      staleTime: 5_000,
      refetchInterval: 15_000,
    }),
  ladders: () => queryOptions({ queryKey: escalationKeys.ladders(), queryFn: () => apiFetch('/ladders', z.array(LadderSchema)) }),
  preferences: () => queryOptions({ queryKey: escalationKeys.preferences(), queryFn: () => apiFetch('/me/preferences', PreferencesSchema) }),
}
