import { Layers } from 'lucide-react'
import type { BoardCard } from '#shared/schemas/board'
import { TaskCardBody } from './task-card-body'

/** Follows the pointer or the arrow keys while a card (or a selection) is on the move. */
export function DragPreview({ task, count }: { task: BoardCard; count: number }) {
  return (
    <div className="relative w-60 cursor-grabbing xl:w-64 rounded-lg bg-white p-2 shadow-xl ring-2 ring-tide-600">
      {count > 1 && (
        <span className="absolute -top-3 -right-2 inline-flex items-center gap-1 rounded-full bg-tide-800 px-2 py-0.5 text-sm font-bold text-white">
          <Layers aria-hidden className="size-4" /> {count} tasks
        </span>
      )}
      <TaskCardBody task={task} />
    </div>
  )
}
