import { useMutation } from '@tanstack/react-query'
import { RoutineSchema, type UpdateRoutineInput } from '#shared/schemas/routine'
import { apiFetch, jsonBody } from '../../../lib/api-client'
import { useInvalidateRoutines } from './use-invalidate-routines'

export function useUpdateRoutine() {
  const onSuccess = useInvalidateRoutines()
  return useMutation({
    mutationFn: ({ id, input }: { id: number; input: UpdateRoutineInput }) => apiFetch(`/routines/${id}`, RoutineSchema, { method: 'PUT', ...jsonBody(input) }),
    onSuccess,
  })
}
