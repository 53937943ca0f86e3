import { queryOptions } from '@tanstack/react-query'
import { z } from 'zod'
import { CalendarDaySchema } from '#shared/schemas/board'
import { apiFetch } from '../../../lib/api-client'

// Under the shared "tasks" root: a move on the board or a reconnect marks the counts stale too.
export const calendarKeys = {
  all: ['tasks', 'calendar'] as const,
  range: (from: string, to: string) => [...calendarKeys.all, from, to] as const,
}

export const calendarQueries = {
  range: (from: string, to: string) =>
    queryOptions({
      queryKey: calendarKeys.range(from, to),
      queryFn: () => apiFetch(`/calendar?${new URLSearchParams({ from, to })}`, z.array(CalendarDaySchema)),
    }),
}
