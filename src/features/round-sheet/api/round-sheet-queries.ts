import { queryOptions } from '@tanstack/react-query'
import { RoundSchema } from '#shared/schemas/round'
import { taskKeys } from '../../../api/tasks/task-keys'
import { apiFetch } from '../../../lib/api-client'

export interface SheetFilter {
  date: string
  personId: number | null
  areaId: number | null
}

function sheetSearch(f: SheetFilter) {
  const params = new URLSearchParams({ date: f.date })
  if (f.personId) params.set('personId', String(f.personId))
  else if (f.areaId) params.set('areaId', String(f.areaId))
  return params
}

export const roundSheetQueries = {
  sheet: (f: SheetFilter) => queryOptions({ queryKey: taskKeys.roundSheet(f), queryFn: () => apiFetch(`/tasks/round-sheet?${sheetSearch(f)}`, RoundSchema) }),
}
