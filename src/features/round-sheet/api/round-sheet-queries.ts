import { queryOptions } from '@tanstack/react-query'
import { z } from 'zod'
import { RoundSchema } from '#shared/schemas/round'
import { StaffMemberSchema } from '#shared/schemas/person'
import { apiFetch } from '../../../lib/api-client'

export interface SheetFilter {
  date: string
  personId: number | null
  areaId: number | null
}

// Under the shared "tasks" root, so anything that invalidates tasks (a live update) refreshes the sheet too.
export const roundSheetKeys = {
  all: ['tasks', 'round-sheet'] as const,
  sheet: (f: SheetFilter) => [...roundSheetKeys.all, f] as const,
  reference: (name: string) => ['round-sheet-references', name] as const,
}

function sheetSearch(f: SheetFilter) {
  const params = new URLSearchParams({ date: f.date })
  if (f.personId) params.set('personId', String(f.personId))
  else if (f.areaId) params.set('areaId', String(f.areaId))
  return params
}

export const roundSheetQueries = {
  sheet: (f: SheetFilter) => queryOptions({ queryKey: roundSheetKeys.sheet(f), queryFn: () => apiFetch(`/tasks/round-sheet?${sheetSearch(f)}`, RoundSchema) }),
  /** Supervisors and managers only. */
  staff: () => queryOptions({ queryKey: roundSheetKeys.reference('staff'), queryFn: () => apiFetch('/staff', z.array(StaffMemberSchema)) }),
  areas: () =>
    queryOptions({
      queryKey: roundSheetKeys.reference('areas'),
      queryFn: () => apiFetch('/areas', z.array(z.object({ id: z.number().int(), code: z.string(), name: z.string(), roundOrder: z.number().int(), quarantine: z.boolean() }))),
    }),
  facility: () =>
    queryOptions({
      queryKey: roundSheetKeys.reference('facility'),
      queryFn: () => apiFetch('/facility', z.object({ name: z.string(), timeZone: z.string() })),
      staleTime: 5 * 60_000,
    }),
}
