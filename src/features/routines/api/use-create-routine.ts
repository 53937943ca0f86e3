import { useMutation } from '@tanstack/react-query'
import { RoutineSchema, type RoutineInput } from '#shared/schemas/routine'
import { apiFetch, jsonBody } from '../../../lib/api-client'
import { useInvalidateRoutines } from './use-invalidate-routines'

export function useCreateRoutine() {
  const onSuccess = useInvalidateRoutines()
  return useMutation({
    mutationFn: (input: RoutineInput) => apiFetch('/routines', RoutineSchema, { method: 'POST', ...jsonBody(input) }),
    onSuccess,
  })
}
