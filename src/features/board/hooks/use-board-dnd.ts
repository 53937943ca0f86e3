import { KeyboardSensor, MouseSensor, TouchSensor, useSensor, useSensors, type DndContextProps, type DragEndEvent, type DragStartEvent } from '@dnd-kit/core'
import { useCallback, useMemo, useState } from 'react'
import type { BoardCard } from '#shared/schemas/board'
import { useMoveTasks } from '../api/use-move-tasks'
import { boardAnnouncements, isOrigin, screenReaderInstructions } from '../utils/announcements'
import { columnId, type DragItem, type DropTarget } from '../utils/drop-targets'
import { createKeyboardNavigation } from '../utils/keyboard-navigation'

interface Options {
  date: string
  /** The cards on screen, in board order; a selection moves only those still shown. */
  visible: BoardCard[]
  selected: ReadonlySet<number>
  clearSelection: () => void
}

// Constant options: a new object each render would make new sensors, and with them a new drag
// context for every card on the board to re-render.
const MOUSE = { activationConstraint: { distance: 5 } }
// A held press on the handle starts a drag; a swipe anywhere else still scrolls the page.
const TOUCH = { activationConstraint: { delay: 250, tolerance: 5 } }

const taskOf = (event: { active: { data: { current?: unknown } } }) => (event.active.data.current as DragItem | undefined)?.task

/** Sensors, keyboard steps, words for screen readers, and what a drop means for the board. */
export function useBoardDnd({ date, visible, selected, clearSelection }: Options) {
  const { mutate: move } = useMoveTasks(date)
  const [nav] = useState(createKeyboardNavigation)
  const [active, setActive] = useState<BoardCard | null>(null)

  const [keyboard] = useState(() => ({ coordinateGetter: nav.coordinateGetter }))
  const sensors = useSensors(useSensor(MouseSensor, MOUSE), useSensor(TouchSensor, TOUCH), useSensor(KeyboardSensor, keyboard))

  const moving = useCallback(
    (task: BoardCard) => (selected.has(task.id) && selected.size > 1 ? [task, ...visible.filter((t) => t.id !== task.id && selected.has(t.id))] : [task]),
    [selected, visible],
  )
  const [pickup] = useState(() => ({ fresh: false }))
  const announcements = useMemo(() => boardAnnouncements(moving, pickup), [moving, pickup])

  const onDragStart = useCallback(
    (event: DragStartEvent) => {
      const task = taskOf(event)
      setActive(task ?? null)
      nav.start(task ? columnId(task.assigneeId) : null)
    },
    [nav],
  )

  const onDragEnd = useCallback(
    ({ active: dragged, over }: DragEndEvent) => {
      setActive(null)
      nav.start(null)
      const task = taskOf({ active: dragged })
      const target = over?.data.current as DropTarget | undefined
      if (!task || !target || isOrigin(task, target)) return
      const tasks = moving(task).filter((t) => !isOrigin(t, target))
      if (target.kind === 'day') move({ tasks, date: target.date })
      else move({ tasks, assigneeId: target.assigneeId, assigneeName: target.assigneeId === null ? null : target.name })
      clearSelection()
    },
    [nav, moving, move, clearSelection],
  )

  const onDragCancel = useCallback(() => {
    setActive(null)
    nav.start(null)
  }, [nav])

  const contextProps: DndContextProps = {
    sensors,
    collisionDetection: nav.collisionDetection,
    accessibility: { announcements, screenReaderInstructions },
    onDragStart,
    onDragEnd,
    onDragCancel,
  }
  return { contextProps, active, movingCount: active ? moving(active).length : 0 }
}
