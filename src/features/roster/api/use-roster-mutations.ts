import { useMutation, useQueryClient } from '@tanstack/react-query'
import { z } from 'zod'
import {
  OnCallDutySchema,
  RotationResultSchema,
  ShiftSchema,
  type OnCallInput,
  type RotationInput,
  type ShiftInput,
  type ShiftPatternInput,
} from '#shared/schemas/roster'
import { apiFetch, jsonBody } from '../../../lib/api-client'
import { rosterKeys } from './roster-queries'

/** Any roster change can move coverage warnings anywhere in the range: refresh the whole roster. */
function useRosterMutation<I, O>(mutationFn: (input: I) => Promise<O>) {
  const queryClient = useQueryClient()
  return useMutation({ mutationFn, onSuccess: () => queryClient.invalidateQueries({ queryKey: rosterKeys.all }) })
}

const post = (body: unknown): RequestInit => ({ method: 'POST', ...jsonBody(body) })

export const useCreateShift = () => useRosterMutation((input: ShiftInput) => apiFetch('/shifts', ShiftSchema, post(input)))
export const useUpdateShift = () =>
  useRosterMutation(({ id, input }: { id: number; input: ShiftInput }) => apiFetch(`/shifts/${id}`, ShiftSchema, { method: 'PATCH', ...jsonBody(input) }))
export const useDeleteShift = () => useRosterMutation((id: number) => apiFetch(`/shifts/${id}`, z.null(), { method: 'DELETE' }))
export const useApplyPattern = () =>
  useRosterMutation((input: ShiftPatternInput) => apiFetch('/shifts/pattern', z.object({ created: z.number(), skipped: z.number() }), post(input)))
export const useCreateDuty = () => useRosterMutation((input: OnCallInput) => apiFetch('/on-call-duties', OnCallDutySchema, post(input)))
export const useDeleteDuty = () => useRosterMutation((id: number) => apiFetch(`/on-call-duties/${id}`, z.null(), { method: 'DELETE' }))
export const useGenerateRotation = () => useRosterMutation((input: RotationInput) => apiFetch('/on-call-duties/rotation', RotationResultSchema, post(input)))
