import { useMutation, useQueryClient } from '@tanstack/react-query'
import { StockSettingsSchema, type StockSettings } from '#shared/schemas/stock'
import { stockKeys } from '../../../api/stock'
import { apiFetch, jsonBody } from '../../../lib/api-client'

/** Saves the facility's causes of death, loss threshold and incident deadlines; the round reads the causes at once. */
export function useUpdateStockSettings() {
  const queryClient = useQueryClient()
  return useMutation({
    mutationFn: (input: Partial<StockSettings>) => apiFetch('/stock/settings', StockSettingsSchema, { method: 'PATCH', ...jsonBody(input) }),
    onSuccess: (saved) => queryClient.setQueryData(stockKeys.settings(), saved),
  })
}
