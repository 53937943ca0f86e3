import { useMutation, useQueryClient } from '@tanstack/react-query'
import { PlaybookSchema, type PlaybookInput } from '#shared/schemas/playbook'
import { apiFetch, jsonBody } from '../../../lib/api-client'
import { playbookKeys } from './playbook-queries'

/** Creates a playbook, or replaces one when an id is given (managers only). */
export function useSavePlaybook() {
  const queryClient = useQueryClient()
  return useMutation({
    mutationFn: ({ id, input }: { id: number | null; input: PlaybookInput }) =>
      apiFetch(id ? `/playbooks/${id}` : '/playbooks', PlaybookSchema, { method: id ? 'PUT' : 'POST', ...jsonBody(input) }),
    onSuccess: (saved) => {
      queryClient.setQueryData(playbookKeys.detail(saved.id), saved)
      return queryClient.invalidateQueries({ queryKey: playbookKeys.lists() })
    },
  })
}
