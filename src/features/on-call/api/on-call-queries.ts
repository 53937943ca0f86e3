import { queryOptions } from '@tanstack/react-query'
import { z } from 'zod'
import { text } from '#shared/schemas/text'
import { HandoverNoteSchema, OnCallDutySchema } from '#shared/schemas/roster'
import { TaskSchema } from '#shared/schemas/task'
import { apiFetch } from '../../../lib/api-client'

// GET /api/on-call has no schema in shared/ yet; this one is built only from shared parts.
export const OnCallSummarySchema = z.object({
  now: OnCallDutySchema.extend({ phone: text().nullable(), email: text().nullable() }).nullable(),
  next: OnCallDutySchema.nullable(),
  weekend: z.object({ from: text(), to: text(), tasks: z.array(TaskSchema) }),
  openFlags: z.array(z.object({ task: TaskSchema, recheck: TaskSchema.nullable() })),
  alerts: z.array(z.object({ id: z.number().int(), kind: text(), detail: text(), startedAt: text(), task: TaskSchema.nullable() })),
  notes: z.array(HandoverNoteSchema),
})
export type OnCallSummary = z.infer<typeof OnCallSummarySchema>
export type WaitingAlert = OnCallSummary['alerts'][number]
export type OpenFlag = OnCallSummary['openFlags'][number]

export const onCallKeys = {
  all: ['on-call'] as const,
  summary: () => [...onCallKeys.all, 'summary'] as const,
}

export const onCallQueries = {
  // Who holds the phone changes at handover and alerts arrive at any time: keep it fresh.
  summary: () =>
    queryOptions({ queryKey: onCallKeys.summary(), queryFn: () => apiFetch('/on-call', OnCallSummarySchema), staleTime: 10_000, refetchInterval: 60_000 }),
}
