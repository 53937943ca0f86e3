import { useMutation, useQueryClient } from '@tanstack/react-query'
import { apiFetch, jsonBody } from '../../../lib/api-client'
import { escalationKeys, PreferencesSchema, type Preferences } from './escalation-queries'

export function useUpdatePreferences() {
  const queryClient = useQueryClient()
  return useMutation({
    mutationFn: (input: Preferences) => apiFetch('/me/preferences', PreferencesSchema, { method: 'PATCH', ...jsonBody(input) }),
    onSuccess: (saved) => queryClient.setQueryData(escalationKeys.preferences(), saved),
  })
}
