import { queryOptions } from '@tanstack/react-query'
import { z } from 'zod'
import { BatchStockSchema, MovementSchema, OnHandByTankSchema, StockSettingsSchema, TankStockSchema } from '#shared/schemas/stock'
import { apiFetch } from '../lib/api-client'

// The stock register is read by the round (counts, causes), the tank and batch pages and reports: one key root.
export const stockKeys = {
  all: ['stock'] as const,
  settings: () => [...stockKeys.all, 'settings'] as const,
  onHand: () => [...stockKeys.all, 'on-hand'] as const,
  tank: (id: number) => [...stockKeys.all, 'tank', id] as const,
  batch: (id: number) => [...stockKeys.all, 'batch', id] as const,
  movements: (where: MovementFilter) => [...stockKeys.all, 'movements', where] as const,
}

export type MovementFilter = { tankId: number } | { batchId: number }

export const stockQueries = {
  settings: () => queryOptions({ queryKey: stockKeys.settings(), queryFn: () => apiFetch('/stock/settings', StockSettingsSchema), staleTime: 5 * 60_000 }),
  onHand: () => queryOptions({ queryKey: stockKeys.onHand(), queryFn: () => apiFetch('/stock/on-hand', OnHandByTankSchema), networkMode: 'offlineFirst' }),
  tank: (id: number) => queryOptions({ queryKey: stockKeys.tank(id), queryFn: () => apiFetch(`/tanks/${id}/stock`, TankStockSchema) }),
  batch: (id: number) => queryOptions({ queryKey: stockKeys.batch(id), queryFn: () => apiFetch(`/batches/${id}/stock`, BatchStockSchema) }),
  movements: (where: MovementFilter) =>
    queryOptions({
      queryKey: stockKeys.movements(where),
      queryFn: () => apiFetch(`/stock/movements?${new URLSearchParams(Object.entries(where).map(([k, v]) => [k, String(v)]))}`, z.array(MovementSchema)),
    }),
}
