import type { QueryClient } from '@tanstack/react-query'
import type { Board, BoardCard } from '#shared/schemas/board'
import type { Task } from '#shared/schemas/task'
import { taskKeys } from './task-keys'

export interface MoveTarget {
  assigneeId?: number | null
  assigneeName?: string | null
  date?: string
}

/** Board order within a day: local time, then id (the server sorts by due instant, which agrees but for a repeated hour). */
// "HH:mm" strings order as plain strings; localeCompare would cost a full day's sort on a phone for nothing.
export const byTime = (a: BoardCard, b: BoardCard) => (a.localTime < b.localTime ? -1 : a.localTime > b.localTime ? 1 : a.id - b.id)

/** The part of a full task a card draws, so the cache never keeps a task's whole record. */
export const toBoardCard = (t: BoardCard): BoardCard => ({
  id: t.id,
  title: t.title,
  category: t.category,
  priority: t.priority,
  durationMinutes: t.durationMinutes,
  targetLabel: t.targetLabel,
  tankId: t.tankId,
  areaId: t.areaId,
  localDate: t.localDate,
  localTime: t.localTime,
  status: t.status,
  assigneeId: t.assigneeId,
  assigneeName: t.assigneeName,
  flag: t.flag,
  heldReason: t.heldReason,
  version: t.version,
})

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
    tasks = [...others, toBoardCard(task)].sort(byTime)
  }
  return tasks === board.tasks ? board : { ...board, tasks }
}

/** For live task events: patches every cached board with one changed task. */
export function patchBoardTask(queryClient: QueryClient, task: Task) {
  for (const [queryKey, board] of queryClient.getQueriesData<Board>({ queryKey: taskKeys.boards() })) {
    if (!board) continue
    const next = placeTasks(board, [task])
    if (next === 'refetch') void queryClient.invalidateQueries({ queryKey, exact: true })
    else if (next !== board) queryClient.setQueryData(queryKey, next)
  }
}
