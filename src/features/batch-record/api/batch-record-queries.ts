import { queryOptions } from '@tanstack/react-query'
import { z } from 'zod'
import { BatchRecordSchema } from '#shared/schemas/batch-record'
import { BatchSchema } from '#shared/schemas/facility'
import { apiFetch } from '../../../lib/api-client'

export const batchRecordKeys = {
  all: ['batch-record'] as const,
  batch: (id: number) => [...batchRecordKeys.all, 'batch', id] as const,
  records: (id: number) => [...batchRecordKeys.all, 'records', id] as const,
}

export const batchRecordQueries = {
  batch: (id: number) => queryOptions({ queryKey: batchRecordKeys.batch(id), queryFn: () => apiFetch(`/batches/${id}`, BatchSchema) }),
  records: (id: number) =>
    queryOptions({ queryKey: batchRecordKeys.records(id), queryFn: () => apiFetch(`/batches/${id}/records`, z.array(BatchRecordSchema)) }),
}
