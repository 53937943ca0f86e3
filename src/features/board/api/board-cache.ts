import type { QueryClient } from '@tanstack/react-query'
import type { Board } from '#shared/schemas/board'
import type { Task } from '#shared/schemas/task'
import { boardKeys } from './board-queries'

export interface MoveTarget {
  assigneeId?: number | null
  assigneeName?: string | null
  date?: string
}

const byDue = (a: Task, b: Task) => a.dueAt.localeCompare(b.dueAt) || a.id - b.id

/** The board as it will look once the server accepts the move; tasks moved to another day leave it. */
export function applyMove(board: Board, ids: ReadonlySet<number>, target: MoveTarget): Board {
  const tasks = board.tasks.flatMap((t) => {
    if (!ids.has(t.id)) return [t]
    if (target.date !== undefined && target.date !== board.date) return []
    if (target.assigneeId === undefined) return [t]
    return [{ ...t, assigneeId: target.assigneeId, assigneeName: target.assigneeName ?? null }]
  })
  return { ...board, tasks }
}

/** Puts tasks the server answered with into a board: replaced in place, added, or removed when they left the day. */
export function placeTasks(board: Board, changed: Task[]): Board | 'refetch' {
  let tasks = board.tasks
  for (const task of changed) {
    const existing = tasks.find((t) => t.id === task.id)
    if (existing && existing.version > task.version) continue
    const others = tasks.filter((t) => t.id !== task.id)
    if (task.localDate !== board.date) {
      if (existing) tasks = others
      continue
    }
    // A column for someone the board does not know yet needs the server's person list.
    if (task.assigneeId !== null && !board.people.some((p) => p.personId === task.assigneeId)) return 'refetch'
    tasks = [...others, task].sort(byDue)
  }
  return tasks === board.tasks ? board : { ...board, tasks }
}

/** For live task events: patches every cached board with one changed task. */
export function patchBoardTask(queryClient: QueryClient, task: Task) {
  for (const [queryKey, board] of queryClient.getQueriesData<Board>({ queryKey: boardKeys.all })) {
    if (!board) continue
    const next = placeTasks(board, [task])
    if (next === 'refetch') void queryClient.invalidateQueries({ queryKey, exact: true })
    else if (next !== board) queryClient.setQueryData(queryKey, next)
  }
}
