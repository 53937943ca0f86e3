import { useMutation, useQueryClient } from '@tanstack/react-query'
import { z } from 'zod'
import { apiFetch } from '../../../lib/api-client'
import { outboxKeys } from './outbox-queries'

/** Local push mode: a stand-in device at the local push service receives my push alerts, shown in the Outbox. */
export function useAddStandInDevice() {
  const queryClient = useQueryClient()
  return useMutation({
    mutationFn: () => apiFetch('/outbox/push-devices', z.null(), { method: 'POST' }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: outboxKeys.pushes() }),
  })
}
