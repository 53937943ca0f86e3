import { queryOptions } from '@tanstack/react-query'
import { z } from 'zod'
import { CoverageWarningSchema, OnCallDutySchema, ShiftSchema } from '#shared/schemas/roster'
import { apiFetch } from '../../../lib/api-client'

export const rosterKeys = {
  all: ['roster'] as const,
  shifts: (from: string, to: string) => [...rosterKeys.all, 'shifts', { from, to }] as const,
  duties: (from: string, to: string) => [...rosterKeys.all, 'duties', { from, to }] as const,
  coverage: (from: string, to: string) => [...rosterKeys.all, 'coverage', { from, to }] as const,
}

const range = (from: string, to: string) => new URLSearchParams({ from, to }).toString()

export const rosterQueries = {
  shifts: (from: string, to: string) =>
    queryOptions({ queryKey: rosterKeys.shifts(from, to), queryFn: () => apiFetch(`/shifts?${range(from, to)}`, z.array(ShiftSchema)) }),
  duties: (from: string, to: string) =>
    queryOptions({ queryKey: rosterKeys.duties(from, to), queryFn: () => apiFetch(`/on-call-duties?${range(from, to)}`, z.array(OnCallDutySchema)) }),
  coverage: (from: string, to: string) =>
    queryOptions({ queryKey: rosterKeys.coverage(from, to), queryFn: () => apiFetch(`/roster/coverage?${range(from, to)}`, z.array(CoverageWarningSchema)) }),
}
