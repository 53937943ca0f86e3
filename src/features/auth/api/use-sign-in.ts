import { useMutation, useQueryClient } from '@tanstack/react-query'
import { PersonSchema, type SignInInput } from '#shared/schemas/person'
import { apiFetch, jsonBody } from '../../../lib/api-client'
import { authKeys } from './auth-queries'

export function useSignIn() {
  const queryClient = useQueryClient()
  return useMutation({
    mutationFn: (input: SignInInput) => apiFetch('/session', PersonSchema, { method: 'POST', ...jsonBody(input) }),
    onSuccess: (person) => {
      queryClient.clear()
      queryClient.setQueryData(authKeys.me, person)
    },
  })
}
