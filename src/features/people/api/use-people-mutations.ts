import { useMutation, useQueryClient } from '@tanstack/react-query'
import { PersonSchema, type CreatePersonInput, type UpdatePersonInput } from '#shared/schemas/person'
import { staffKeys } from '../../../api/staff'
import { apiFetch, jsonBody } from '../../../lib/api-client'

function useInvalidatePeople() {
  const queryClient = useQueryClient()
  // A new, renamed or deactivated person changes the planners' staff lists too.
  return () => Promise.all([queryClient.invalidateQueries({ queryKey: staffKeys.people }), queryClient.invalidateQueries({ queryKey: staffKeys.staff })])
}

export function useCreatePerson() {
  const onSuccess = useInvalidatePeople()
  return useMutation({
    mutationFn: (input: CreatePersonInput) => apiFetch('/people', PersonSchema, { method: 'POST', ...jsonBody(input) }),
    onSuccess,
  })
}

export function useUpdatePerson() {
  const onSuccess = useInvalidatePeople()
  return useMutation({
    mutationFn: ({ id, ...input }: UpdatePersonInput & { id: number }) => apiFetch(`/people/${id}`, PersonSchema, { method: 'PATCH', ...jsonBody(input) }),
    onSuccess,
  })
}

export function useResetPassword() {
  return useMutation({
    mutationFn: ({ id, password }: { id: number; password: string }) =>
      apiFetch(`/people/${id}/password`, PersonSchema, { method: 'POST', ...jsonBody({ password }) }),
  })
}
