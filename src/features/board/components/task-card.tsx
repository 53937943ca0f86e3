import { useDraggable } from '@dnd-kit/core'
import { clsx } from 'clsx'
import { GripVertical } from 'lucide-react'
import type { KeyboardEventHandler, MouseEvent, MouseEventHandler, TouchEventHandler } from 'react'
import type { BoardCard } from '#shared/schemas/board'
import { cardId, type DragItem } from '../utils/drop-targets'
import { taskPhrase } from '../utils/task-text'
import type { CardPlacement } from './card-list'
import { TaskCardBody } from './task-card-body'

interface Props {
  task: BoardCard
  /** Supervisors and managers move unfinished cards; everyone else reads. */
  movable: boolean
  selected: boolean
  onToggle: (taskId: number) => void
  /** Set when the column draws only a window of its cards. */
  placement?: CardPlacement
}

const fromControl = (e: MouseEvent) => (e.target as HTMLElement).closest('input, label, a') !== null

/**
 * One task on the board. A mouse drags the whole card; touch and keyboard use the handle,
 * which alone has `touch-action: none`, so a swipe over the card still scrolls the page.
 */
export function TaskCard({ task, movable, selected, onToggle, placement }: Props) {
  const item: DragItem = { task }
  const { setNodeRef, setActivatorNodeRef, listeners, attributes, isDragging } = useDraggable({
    id: cardId(task.id),
    data: item,
    disabled: !movable,
    attributes: { roleDescription: 'movable task' },
  })
  const onMouseDown = listeners?.onMouseDown as MouseEventHandler | undefined
  const phrase = taskPhrase(task)

  return (
    <li
      ref={(el) => {
        setNodeRef(el)
        placement?.measure(el)
      }}
      data-task-id={task.id}
      data-index={placement?.index}
      style={placement && { position: 'absolute', top: 0, left: 8, right: 8, transform: `translateY(${placement.start}px)` }}
      onMouseDown={(e) => !fromControl(e) && onMouseDown?.(e)}
      onClick={(e) => movable && e.shiftKey && !fromControl(e) && onToggle(task.id)}
      className={clsx(
        'relative flex items-start gap-1.5 rounded-lg bg-white p-2 shadow-sm ring-1 select-none',
        selected ? 'ring-2 ring-tide-600' : 'ring-tide-200',
        task.status === 'missed' && !selected && 'ring-2 ring-alarm-500',
        movable && 'cursor-grab',
        isDragging && 'opacity-40',
      )}
    >
      {movable && (
        <button
          ref={setActivatorNodeRef}
          type="button"
          {...attributes}
          onKeyDown={listeners?.onKeyDown as KeyboardEventHandler | undefined}
          onTouchStart={listeners?.onTouchStart as TouchEventHandler | undefined}
          aria-label={`Move ${phrase}`}
          className="-my-1 -ml-1 flex min-h-11 w-8 shrink-0 self-stretch touch-none items-center justify-center rounded text-tide-500 hover:bg-tide-50 hover:text-tide-800"
        >
          <GripVertical aria-hidden className="size-5" />
        </button>
      )}
      <TaskCardBody task={task} cornerTaken={movable} />
      {movable && (
        <label className="absolute top-0.5 right-0.5 flex size-9 cursor-pointer items-center justify-center rounded hover:bg-tide-50">
          <input type="checkbox" checked={selected} onChange={() => onToggle(task.id)} aria-label={`Select ${phrase}`} className="size-4 accent-tide-700" />
        </label>
      )}
    </li>
  )
}
