import { queryOptions } from '@tanstack/react-query'
import { z } from 'zod'
import { FacilitySchema } from '#shared/schemas/facility'
import { EscalationRecordSchema, LadderSchema } from '#shared/schemas/ladder'
import { ParameterSchema } from '#shared/schemas/parameter'
import { StaffMemberSchema } from '#shared/schemas/person'
import { TaskSchema } from '#shared/schemas/task'
import { ApiError, apiFetch } from '../../../lib/api-client'

// GET/PATCH /api/me/preferences has no schema in shared/ yet (PreferencesInputSchema sits in the server's routes).
export const PreferencesSchema = z.object({ email: z.string(), quietStart: z.string().nullable(), quietEnd: z.string().nullable() })
export type Preferences = z.infer<typeof PreferencesSchema>

export const escalationKeys = {
  all: ['escalation'] as const,
  // Under the shared "tasks" root so a live reconnect's catch-up refreshes the task page too.
  task: (id: number) => ['tasks', 'detail', id] as const,
  record: (taskId: number) => [...escalationKeys.all, 'record', taskId] as const,
  ladders: () => [...escalationKeys.all, 'ladders'] as const,
  preferences: () => [...escalationKeys.all, 'preferences'] as const,
  staff: () => [...escalationKeys.all, 'staff'] as const,
  facility: () => [...escalationKeys.all, 'facility'] as const,
  parameters: () => [...escalationKeys.all, 'parameters'] as const,
}

async function facilityZone() {
  try {
    return (await apiFetch('/facility', FacilitySchema)).timeZone
  } catch (error) {
    if (error instanceof ApiError && error.status === 404) return Intl.DateTimeFormat().resolvedOptions().timeZone
    throw error
  }
}

export const escalationQueries = {
  task: (id: number) => queryOptions({ queryKey: escalationKeys.task(id), queryFn: () => apiFetch(`/tasks/${id}`, TaskSchema) }),
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
  /** Managers and supervisors only. */
  staff: () => queryOptions({ queryKey: escalationKeys.staff(), queryFn: () => apiFetch('/staff', z.array(StaffMemberSchema)) }),
  parameters: () =>
    queryOptions({ queryKey: escalationKeys.parameters(), queryFn: () => apiFetch('/parameters', z.array(ParameterSchema)), staleTime: 10 * 60_000 }),
  timeZone: () => queryOptions({ queryKey: escalationKeys.facility(), queryFn: facilityZone, staleTime: 10 * 60_000 }),
}
