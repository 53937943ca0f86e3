import { useMutation, useQueryClient } from '@tanstack/react-query'
import { apiFetch, jsonBody } from '../../../lib/api-client'
import { PreferencesSchema, type PreferencesInput } from '#shared/schemas/person'
import { escalationKeys } from './escalation-queries'

export function useUpdatePreferences() {
  const queryClient = useQueryClient()
  return useMutation({
    mutationFn: (input: PreferencesInput) => apiFetch('/me/preferences', PreferencesSchema, { method: 'PATCH', ...jsonBody(input) }),
    onSuccess: (saved) => queryClient.setQueryData(escalationKeys.preferences(), saved),
  })
}
