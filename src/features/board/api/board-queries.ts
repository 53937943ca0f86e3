import { queryOptions } from '@tanstack/react-query'
import { BoardWireSchema, unfoldBoard } from '#shared/schemas/board'
import { taskKeys } from '../../../api/tasks/task-keys'
import { apiFetch } from '../../../lib/api-client'

export const boardQueries = {
  day: (date: string) =>
    queryOptions({
      queryKey: taskKeys.board(date),
      // Sent compact (each kind and target once); the cache holds plain cards.
      queryFn: async () => unfoldBoard(await apiFetch(`/tasks/board?date=${date}`, BoardWireSchema)),
    }),
}
