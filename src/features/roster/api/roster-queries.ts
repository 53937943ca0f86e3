import { queryOptions } from '@tanstack/react-query'
import { z } from 'zod'
import { FacilitySchema } from '#shared/schemas/facility'
import { StaffMemberSchema } from '#shared/schemas/person'
import { CoverageWarningSchema, OnCallDutySchema, ShiftSchema } from '#shared/schemas/roster'
import { ApiError, apiFetch } from '../../../lib/api-client'

export const rosterKeys = {
  all: ['roster'] as const,
  shifts: (from: string, to: string) => [...rosterKeys.all, 'shifts', { from, to }] as const,
  duties: (from: string, to: string) => [...rosterKeys.all, 'duties', { from, to }] as const,
  coverage: (from: string, to: string) => [...rosterKeys.all, 'coverage', { from, to }] as const,
  staff: () => [...rosterKeys.all, 'staff'] as const,
  facility: () => [...rosterKeys.all, 'facility'] as const,
}

const range = (from: string, to: string) => new URLSearchParams({ from, to }).toString()

async function facilityTimes() {
  try {
    const { timeZone, handoverTime } = await apiFetch('/facility', FacilitySchema)
    return { timeZone, handoverTime: handoverTime as string | null }
  } catch (error) {
    // No facility row yet (fresh database): plan in the browser's zone.
    if (error instanceof ApiError && error.status === 404) return { timeZone: Intl.DateTimeFormat().resolvedOptions().timeZone, handoverTime: null }
    throw error
  }
}

export const rosterQueries = {
  shifts: (from: string, to: string) =>
    queryOptions({ queryKey: rosterKeys.shifts(from, to), queryFn: () => apiFetch(`/shifts?${range(from, to)}`, z.array(ShiftSchema)) }),
  duties: (from: string, to: string) =>
    queryOptions({ queryKey: rosterKeys.duties(from, to), queryFn: () => apiFetch(`/on-call-duties?${range(from, to)}`, z.array(OnCallDutySchema)) }),
  coverage: (from: string, to: string) =>
    queryOptions({ queryKey: rosterKeys.coverage(from, to), queryFn: () => apiFetch(`/roster/coverage?${range(from, to)}`, z.array(CoverageWarningSchema)) }),
  /** Active people, for planners (GET /api/people is for managers only). */
  staff: () => queryOptions({ queryKey: rosterKeys.staff(), queryFn: () => apiFetch('/staff', z.array(StaffMemberSchema)) }),
  facility: () => queryOptions({ queryKey: rosterKeys.facility(), queryFn: facilityTimes, staleTime: 10 * 60_000 }),
}
