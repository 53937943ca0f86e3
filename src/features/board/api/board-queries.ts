import { queryOptions } from '@tanstack/react-query'
import { BoardWireSchema, unfoldBoard } from '#shared/schemas/board'
import { apiFetch } from '../../../lib/api-client'

// Under the shared "tasks" root, so a generic tasks invalidation (a reconnect, a move) reaches the board.
export const boardKeys = {
  all: ['tasks', 'board'] as const,
  day: (date: string) => [...boardKeys.all, date] as const,
}

export const boardQueries = {
  day: (date: string) =>
    queryOptions({
      queryKey: boardKeys.day(date),
      // Sent compact (each kind and target once); the cache holds plain cards.
      queryFn: async () => unfoldBoard(await apiFetch(`/tasks/board?date=${date}`, BoardWireSchema)),
    }),
}
