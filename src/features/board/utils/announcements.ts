import type { Active, Announcements, Over, ScreenReaderInstructions } from '@dnd-kit/core'
import type { BoardCard } from '#shared/schemas/board'
import { longDay } from './board-dates'
import type { DragItem, DropTarget } from './drop-targets'
import { taskPhrase } from './task-text'

export const screenReaderInstructions: ScreenReaderInstructions = {
  draggable:
    'To move this task, press space to pick it up. Left and right arrows go from column to column; ' +
    'up reaches the days of the week and down comes back. Press space to drop it, or escape to put it back.',
}

const taskOf = (active: Active) => (active.data.current as DragItem | undefined)?.task
const targetOf = (over: Over | null) => over?.data.current as DropTarget | undefined

const overText = (t: DropTarget) => (t.kind === 'day' ? longDay(t.date) : t.assigneeId === null ? 'Unassigned' : `${t.name}'s column`)

/** Whether dropping here changes nothing for this task. */
export const isOrigin = (task: BoardCard, t: DropTarget) => (t.kind === 'day' ? t.date === task.localDate : t.assigneeId === task.assigneeId)

/**
 * Words for screen readers, never ids. `moving` gives the tasks that travel with the one picked
 * up (a selection); the card's own task is always first. `pickup` outlives re-renders mid-drag.
 */
export function boardAnnouncements(moving: (task: BoardCard) => BoardCard[], pickup: { fresh: boolean }): Announcements {
  const what = (task: BoardCard) => {
    const all = moving(task)
    return all.length > 1 ? `${all.length} tasks, starting with ${taskPhrase(task)}` : taskPhrase(task)
  }
  const count = (task: BoardCard) => {
    const n = moving(task).length
    return n > 1 ? `${n} tasks` : task.title
  }
  return {
    onDragStart: ({ active }) => {
      const task = taskOf(active)
      pickup.fresh = true
      return task && `Picked up ${what(task)}.`
    },
    onDragOver: ({ active, over }) => {
      const task = taskOf(active)
      const target = targetOf(over)
      // The first "over" after a pick-up is the card's own column; saying so would cut off "Picked up".
      const first = pickup.fresh
      pickup.fresh = false
      if (!task || (first && target && isOrigin(task, target))) return undefined
      return target ? `Over ${overText(target)}.` : 'Not over a column or a day.'
    },
    onDragEnd: ({ active, over }) => {
      const task = taskOf(active)
      const target = targetOf(over)
      if (!task) return undefined
      if (!target || isOrigin(task, target)) return `Dropped where it was; ${count(task)} did not move.`
      if (target.kind === 'day') return `${count(task)} moved to ${longDay(target.date)}.`
      if (target.assigneeId === null) return `${count(task)} moved to Unassigned.`
      return `${count(task)} assigned to ${target.name}.`
    },
    onDragCancel: ({ active }) => {
      const task = taskOf(active)
      if (!task) return undefined
      return moving(task).length > 1 ? `Put back; ${count(task)} stay where they were.` : `Put back; ${count(task)} stays where it was.`
    },
  }
}
