import { useMutation, useQueryClient } from '@tanstack/react-query'
import { toast } from 'sonner'
import { z } from 'zod'
import { text } from '#shared/schemas/text'
import type { Board, BoardCard } from '#shared/schemas/board'
import { TaskSchema } from '#shared/schemas/task'
import { applyMove, placeTasks, type MoveTarget } from '../../../api/tasks/board-cache'
import { taskKeys } from '../../../api/tasks/task-keys'
import { apiFetch, jsonBody } from '../../../lib/api-client'

const BulkMoveResultSchema = z.object({
  moved: z.array(TaskSchema),
  refused: z.array(z.object({ id: z.number().int(), message: text() })),
})
type MoveResult = z.infer<typeof BulkMoveResultSchema>

export interface MoveRequest extends MoveTarget {
  tasks: BoardCard[]
}

const MOVE_KEY = ['board', 'move'] as const

async function sendMove({ tasks, assigneeId, date }: MoveRequest): Promise<MoveResult> {
  if (tasks.length === 1) {
    const [task] = tasks
    const moved = await apiFetch(`/tasks/${task.id}`, TaskSchema, { method: 'PATCH', ...jsonBody({ version: task.version, assigneeId, date }) })
    return { moved: [moved], refused: [] }
  }
  const body = { tasks: tasks.map(({ id, version }) => ({ id, version })), assigneeId, date }
  return apiFetch('/tasks/bulk-move', BulkMoveResultSchema, { method: 'POST', ...jsonBody(body) })
}

function refusalText(result: MoveResult, tasks: BoardCard[]) {
  const title = (id: number) => tasks.find((t) => t.id === id)?.title ?? 'A task'
  if (result.refused.length === 1) return `${title(result.refused[0].id)} stayed where it was: ${result.refused[0].message}`
  return `${result.refused.length} tasks stayed where they were: ${result.refused.map((r) => `${title(r.id)}: ${r.message}`).join(' ')}`
}

/**
 * Assigns, unassigns or moves cards to another day. The board changes at once and rolls back
 * if the server says no; its message reaches the user through the mutation cache's toast.
 */
export function useMoveTasks(date: string) {
  const queryClient = useQueryClient()
  const key = taskKeys.board(date)
  return useMutation({
    mutationKey: MOVE_KEY,
    mutationFn: sendMove,
    onMutate: async (move) => {
      await queryClient.cancelQueries({ queryKey: key })
      const before = queryClient.getQueryData<Board>(key)
      if (before) queryClient.setQueryData(key, applyMove(before, new Set(move.tasks.map((t) => t.id)), move))
      return { before }
    },
    onError: (_error, _move, context) => {
      if (context?.before) queryClient.setQueryData(key, context.before)
    },
    onSuccess: (result, move, context) => {
      if (result.refused.length && context?.before) {
        // Put the refused cards back where they were, keep the ones that moved.
        const refused = new Set(result.refused.map((r) => r.id))
        const board = queryClient.getQueryData<Board>(key)
        if (board) {
          const back = context.before.tasks.filter((t) => refused.has(t.id))
          const restored = { ...board, tasks: [...board.tasks.filter((t) => !refused.has(t.id)), ...back] }
          queryClient.setQueryData(key, restored)
        }
        toast.error(refusalText(result, move.tasks))
      }
      const board = queryClient.getQueryData<Board>(key)
      const placed = board ? placeTasks(board, result.moved) : 'refetch'
      if (board && placed !== 'refetch') queryClient.setQueryData(key, placed)
    },
    onSettled: () => {
      // Refetch once the last of several quick moves is done, so an early answer cannot undo a later drag.
      if (queryClient.isMutating({ mutationKey: MOVE_KEY }) === 1) void queryClient.invalidateQueries({ queryKey: taskKeys.all })
    },
  })
}
