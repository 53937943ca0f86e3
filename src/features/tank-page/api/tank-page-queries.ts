import { queryOptions } from '@tanstack/react-query'
import { apiFetch } from '../../../lib/api-client'
import { TankOverviewSchema, TankReadingsSchema } from '#shared/schemas/tank-page'

export const TREND_RANGES = [7, 30, 90] as const
export type TrendRange = (typeof TREND_RANGES)[number]

export const tankPageKeys = {
  all: ['tank-page'] as const,
  overview: (id: number) => [...tankPageKeys.all, 'overview', id] as const,
  readings: (id: number, days: TrendRange) => [...tankPageKeys.all, 'readings', id, days] as const,
}

/** The window ends now and is worked out when fetched, so a refetch moves it along. */
async function fetchReadings(id: number, days: TrendRange) {
  const to = new Date()
  const from = new Date(to.getTime() - days * 86_400_000)
  const search = new URLSearchParams({ from: from.toISOString(), to: to.toISOString() })
  const readings = await apiFetch(`/tanks/${id}/readings?${search}`, TankReadingsSchema)
  return { ...readings, from: from.getTime(), to: to.getTime() }
}

export const tankPageQueries = {
  overview: (id: number) => queryOptions({ queryKey: tankPageKeys.overview(id), queryFn: () => apiFetch(`/tanks/${id}/overview`, TankOverviewSchema) }),
  readings: (id: number, days: TrendRange) => queryOptions({ queryKey: tankPageKeys.readings(id, days), queryFn: () => fetchReadings(id, days) }),
}
