import { queryOptions } from '@tanstack/react-query'
import { BoardSchema } from '#shared/schemas/board'
import { apiFetch } from '../../../lib/api-client'

// Under the shared "tasks" root, so a generic tasks invalidation (a reconnect, a move) reaches the board.
export const boardKeys = {
  all: ['tasks', 'board'] as const,
  day: (date: string) => [...boardKeys.all, date] as const,
}

export const boardQueries = {
  day: (date: string) =>
    queryOptions({ queryKey: boardKeys.day(date), queryFn: () => apiFetch(`/tasks/board?date=${date}`, BoardSchema) }),
}
