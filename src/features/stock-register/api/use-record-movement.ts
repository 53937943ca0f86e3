import { useMutation, useQueryClient } from '@tanstack/react-query'
import { MovementSchema, type ParsedMovementInput } from '#shared/schemas/stock'
import { catalogueKeys } from '../../../api/catalogues'
import { stockKeys } from '../../../api/stock'
import { apiFetch, jsonBody } from '../../../lib/api-client'

/** Adds a movement to the register; every count and figure is read again, and the batch's count with them. */
export function useRecordMovement() {
  const queryClient = useQueryClient()
  return useMutation({
    mutationFn: (input: ParsedMovementInput) => apiFetch('/stock/movements', MovementSchema, { method: 'POST', ...jsonBody(input) }),
    onSuccess: () =>
      Promise.all([queryClient.invalidateQueries({ queryKey: stockKeys.all }), queryClient.invalidateQueries({ queryKey: catalogueKeys.list('batches') })]),
  })
}
