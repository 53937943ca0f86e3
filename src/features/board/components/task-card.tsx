import { useDraggable, type DraggableAttributes, type DraggableSyntheticListeners } from '@dnd-kit/core'
import { clsx } from 'clsx'
import { GripVertical } from 'lucide-react'
import { memo, useCallback, useMemo, type KeyboardEventHandler, type MouseEvent, type MouseEventHandler, type TouchEventHandler } from 'react'
import type { BoardCard } from '#shared/schemas/board'
import { cardId, type DragItem } from '../utils/drop-targets'
import { taskPhrase } from '../utils/task-text'
import { TaskCardBody } from './task-card-body'

interface Props {
  task: BoardCard
  /** Supervisors and managers move unfinished cards; everyone else reads. */
  movable: boolean
  selected: boolean
  onToggle: (taskId: number) => void
  /** Set when the column draws only a window of its cards: where the card sits, and how it reports its height. */
  index?: number
  start?: number
  measure?: (el: Element | null) => void
}

const fromControl = (e: MouseEvent) => (e.target as HTMLElement).closest('input, label, a') !== null

/**
 * One task on the board. A mouse drags the whole card; touch and keyboard use the handle,
 * which alone has `touch-action: none`, so a swipe over the card still scrolls the page.
 *
 * Every drawn card re-renders when a drag starts, changes target or ends (dnd-kit's context), so
 * the card is memoised and so are its parts: such a render redraws only the `<li>` itself. Its ref
 * callback is stable too: a new one each render made React detach and attach it, and the column's
 * virtualizer measured every card again (a forced layout per card).
 */
export const TaskCard = memo(function TaskCard({ task, movable, selected, onToggle, index, start, measure }: Props) {
  const item: DragItem = useMemo(() => ({ task }), [task])
  const { setNodeRef, setActivatorNodeRef, listeners, attributes, isDragging } = useDraggable({
    id: cardId(task.id),
    data: item,
    disabled: !movable,
    attributes: { roleDescription: 'movable task' },
  })
  const ref = useCallback(
    (el: HTMLLIElement | null) => {
      setNodeRef(el)
      measure?.(el)
    },
    [setNodeRef, measure],
  )
  const onMouseDown = listeners?.onMouseDown as MouseEventHandler | undefined
  const phrase = taskPhrase(task)

  return (
    <li
      ref={ref}
      data-task-id={task.id}
      data-index={index}
      style={start === undefined ? undefined : { position: 'absolute', top: 0, left: 8, right: 8, transform: `translateY(${start}px)` }}
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
      {movable && <DragHandle handleRef={setActivatorNodeRef} attributes={attributes} listeners={listeners} phrase={phrase} />}
      <TaskCardBody task={task} cornerTaken={movable} />
      {movable && <SelectBox taskId={task.id} selected={selected} onToggle={onToggle} phrase={phrase} />}
    </li>
  )
})

interface HandleProps {
  handleRef: (el: HTMLElement | null) => void
  attributes: DraggableAttributes
  listeners: DraggableSyntheticListeners
  phrase: string
}

const DragHandle = memo(function DragHandle({ handleRef, attributes, listeners, phrase }: HandleProps) {
  return (
    <button
      ref={handleRef}
      type="button"
      {...attributes}
      onKeyDown={listeners?.onKeyDown as KeyboardEventHandler | undefined}
      onTouchStart={listeners?.onTouchStart as TouchEventHandler | undefined}
      aria-label={`Move ${phrase}`}
      className="-my-1 -ml-1 flex min-h-11 w-8 shrink-0 self-stretch touch-none items-center justify-center rounded text-tide-500 hover:bg-tide-50 hover:text-tide-800"
    >
      <GripVertical aria-hidden className="size-5" />
    </button>
  )
})

interface SelectProps {
  taskId: number
  selected: boolean
  onToggle: (taskId: number) => void
  phrase: string
}

const SelectBox = memo(function SelectBox({ taskId, selected, onToggle, phrase }: SelectProps) {
  return (
    <label className="absolute top-0.5 right-0.5 flex size-9 cursor-pointer items-center justify-center rounded hover:bg-tide-50">
      <input type="checkbox" checked={selected} onChange={() => onToggle(taskId)} aria-label={`Select ${phrase}`} className="size-4 accent-tide-700" />
    </label>
  )
})
