import { queryOptions } from '@tanstack/react-query'
import { z } from 'zod'
import { CalendarDaySchema } from '#shared/schemas/board'
import { taskKeys } from '../../../api/tasks/task-keys'
import { apiFetch } from '../../../lib/api-client'

export const calendarQueries = {
  range: (from: string, to: string) =>
    queryOptions({
      queryKey: taskKeys.calendar(from, to),
      queryFn: () => apiFetch(`/calendar?${new URLSearchParams({ from, to })}`, z.array(CalendarDaySchema)),
    }),
}
