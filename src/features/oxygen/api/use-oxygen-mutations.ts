import { useMutation, useQueryClient } from '@tanstack/react-query'
import type { z } from 'zod'
import { CylinderStatusSchema, type CylinderInput, type CylinderReadingInputSchema } from '#shared/schemas/oxygen'
import { taskKeys } from '../../../api/tasks/task-keys'
import { apiFetch, jsonBody } from '../../../lib/api-client'
import { oxygenKeys } from './oxygen-queries'

/** A gauge reading; when it raises a replace task the board changes too. */
export function useRecordCylinderReading() {
  const queryClient = useQueryClient()
  return useMutation({
    mutationFn: ({ id, reading }: { id: number; reading: z.input<typeof CylinderReadingInputSchema> }) =>
      apiFetch(`/oxygen/cylinders/${id}/readings`, CylinderStatusSchema, { method: 'POST', ...jsonBody(reading) }),
    onSuccess: (status) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: oxygenKeys.cylinders() }),
        status.replaceTaskId ? queryClient.invalidateQueries({ queryKey: taskKeys.all }) : null,
      ]),
  })
}

export function useAddCylinder() {
  const queryClient = useQueryClient()
  return useMutation({
    mutationFn: (input: CylinderInput) => apiFetch('/oxygen/cylinders', CylinderStatusSchema, { method: 'POST', ...jsonBody(input) }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: oxygenKeys.cylinders() }),
  })
}
