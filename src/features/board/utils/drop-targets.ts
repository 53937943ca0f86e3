import type { BoardCard } from '#shared/schemas/board'

/** What a card can be dropped on: a column (who does it) or a day of the week strip (when). */
export type DropTarget = { kind: 'column'; assigneeId: number | null; name: string } | { kind: 'day'; date: string }

export interface DragItem {
  task: BoardCard
}

export const cardId = (taskId: number) => `task-${taskId}`
export const columnId = (assigneeId: number | null) => (assigneeId === null ? 'column-unassigned' : `column-person-${assigneeId}`)
export const dayId = (date: string) => `day-${date}`
