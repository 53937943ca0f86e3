import { useMutation, useQueryClient } from '@tanstack/react-query'
import { BatchRecordSchema, type BatchRecordInput } from '#shared/schemas/batch-record'
import { apiFetch, jsonBody } from '../../../lib/api-client'
import { batchRecordKeys } from './batch-record-queries'

/** Adds to a batch's record; a weighing can change the batch's mean weight, so the batch is read again. */
export function useAddRecord(batchId: number) {
  const queryClient = useQueryClient()
  return useMutation({
    mutationFn: (input: BatchRecordInput) => apiFetch(`/batches/${batchId}/records`, BatchRecordSchema, { method: 'POST', ...jsonBody(input) }),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: batchRecordKeys.records(batchId) }),
        queryClient.invalidateQueries({ queryKey: batchRecordKeys.batch(batchId) }),
      ]),
  })
}
