import { useMutation, useQueryClient } from '@tanstack/react-query'
import { text } from '#shared/schemas/text'
import { z } from 'zod'
import { apiFetch, jsonBody } from '../../../lib/api-client'
import { outboxKeys } from './outbox-queries'

/** Local mode: the stand-in provider delivers a reply from the text's recipient to the app. */
export function useReplyToText() {
  const queryClient = useQueryClient()
  return useMutation({
    mutationFn: ({ id, body }: { id: number; body: string }) =>
      apiFetch(`/outbox/texts/${id}/reply`, z.object({ answer: text() }), { method: 'POST', ...jsonBody({ body }) }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: outboxKeys.all }),
  })
}
