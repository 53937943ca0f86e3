import { queryOptions } from '@tanstack/react-query'
import { BoardCardWireSchema, BoardWireEnvelopeSchema, cardAt, cardUnfolder, type Board } from '#shared/schemas/board'
import { taskKeys } from '../../../api/tasks/task-keys'
import { apiFetch } from '../../../lib/api-client'
import { parseInSlices } from '../../../lib/parse-in-slices'

export const boardQueries = {
  day: (date: string) =>
    queryOptions({
      queryKey: taskKeys.board(date),
      // Sent compact (each kind and target once, the cards as columns); the cache holds plain cards. A full day's cards
      // are checked and unfolded a slice at a time, so a phone's main thread never blocks on them.
      queryFn: async (): Promise<Board> => {
        const wire = await apiFetch(`/tasks/board?date=${date}`, BoardWireEnvelopeSchema)
        const unfold = cardUnfolder(wire)
        const tasks = await parseInSlices(wire.cards.id.length, (i) => cardAt(wire.cards, i), BoardCardWireSchema, unfold)
        return { date: wire.date, people: wire.people, tasks }
      },
    }),
}
