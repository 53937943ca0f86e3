import { queryOptions } from '@tanstack/react-query'
import { z } from 'zod'
import { FacilitySchema } from '#shared/schemas/facility'
import { HandoverNoteSchema, OnCallDutySchema } from '#shared/schemas/roster'
import { TaskSchema } from '#shared/schemas/task'
import { ApiError, apiFetch } from '../../../lib/api-client'

// GET /api/on-call has no schema in shared/ yet; this one is built only from shared parts.
export const OnCallSummarySchema = z.object({
  now: OnCallDutySchema.extend({ phone: z.string().nullable(), email: z.string().nullable() }).nullable(),
  next: OnCallDutySchema.nullable(),
  weekend: z.object({ from: z.string(), to: z.string(), tasks: z.array(TaskSchema) }),
  openFlags: z.array(z.object({ task: TaskSchema, recheck: TaskSchema.nullable() })),
  alerts: z.array(z.object({ id: z.number().int(), kind: z.string(), detail: z.string(), startedAt: z.string(), task: TaskSchema.nullable() })),
  notes: z.array(HandoverNoteSchema),
})
export type OnCallSummary = z.infer<typeof OnCallSummarySchema>
export type WaitingAlert = OnCallSummary['alerts'][number]
export type OpenFlag = OnCallSummary['openFlags'][number]

export const onCallKeys = {
  all: ['on-call'] as const,
  summary: () => [...onCallKeys.all, 'summary'] as const,
  facility: () => [...onCallKeys.all, 'facility'] as const,
}

async function facilityZone() {
  try {
    return (await apiFetch('/facility', FacilitySchema)).timeZone
  } catch (error) {
    // No facility row yet (fresh database): fall back to the browser's zone.
    if (error instanceof ApiError && error.status === 404) return Intl.DateTimeFormat().resolvedOptions().timeZone
    throw error
  }
}

export const onCallQueries = {
  // Who holds the phone changes at handover and alerts arrive at any time: keep it fresh.
  summary: () =>
    queryOptions({ queryKey: onCallKeys.summary(), queryFn: () => apiFetch('/on-call', OnCallSummarySchema), staleTime: 10_000, refetchInterval: 60_000 }),
  timeZone: () => queryOptions({ queryKey: onCallKeys.facility(), queryFn: facilityZone, staleTime: 10 * 60_000 }),
}
