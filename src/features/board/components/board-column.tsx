import { useDroppable } from '@dnd-kit/core'
import { clsx } from 'clsx'
import { memo, useCallback, useId, useMemo, useRef, type ReactNode } from 'react'
import type { BoardCard, BoardColumnPerson } from '#shared/schemas/board'
import { useNearViewport } from '../hooks/use-near-viewport'
import { columnId, type DropTarget } from '../utils/drop-targets'
import { CardList, CardListPlaceholder, type CardPlacement } from './card-list'
import { ColumnHeader } from './column-header'

interface Props {
  person: BoardColumnPerson | null
  /** Every task in the column, filtered or not, for the header's totals. */
  allTasks: BoardCard[]
  shown: BoardCard[]
  droppable: boolean
  /** The card being dragged, given only to the column it comes from (the others need not redraw). */
  activeId: number | null
  renderCard: (task: BoardCard, placement?: CardPlacement) => ReactNode
}

/** Unassigned, or one person's day: a drop target for cards. Memoised: a drag redraws only the columns it touches. */
export const BoardColumn = memo(function BoardColumn({ person, allTasks, shown, droppable, activeId, renderCard }: Props) {
  const headingId = useId()
  const target: DropTarget = person
    ? { kind: 'column', assigneeId: person.personId, name: person.name }
    : { kind: 'column', assigneeId: null, name: 'Unassigned' }
  const { setNodeRef, isOver } = useDroppable({ id: columnId(target.assigneeId), data: target, disabled: !droppable })
  const sectionRef = useRef<HTMLElement | null>(null)
  const setRefs = useCallback(
    (el: HTMLElement | null) => {
      sectionRef.current = el
      setNodeRef(el)
    },
    [setNodeRef],
  )
  // The column (a drop target, with its totals) is always there; its cards are drawn once it is near the viewport.
  const near = useNearViewport(sectionRef)
  const hidden = allTasks.length - shown.length
  const plannedMinutes = useMemo(() => allTasks.reduce((sum, t) => sum + t.durationMinutes, 0), [allTasks])

  return (
    <section
      ref={setRefs}
      aria-labelledby={headingId}
      className={clsx(
        'flex min-w-0 flex-col rounded-xl ring-1 transition-colors md:w-60 md:shrink-0 xl:w-64',
        person === null ? 'bg-tide-100/70' : 'bg-tide-50',
        isOver ? 'ring-2 ring-tide-600 bg-tide-100' : 'ring-tide-200',
      )}
    >
      <ColumnHeader headingId={headingId} person={person} taskCount={allTasks.length} plannedMinutes={plannedMinutes} />
      {near ? <CardList cards={shown} activeId={activeId} renderCard={renderCard} /> : <CardListPlaceholder count={shown.length} />}
      {shown.length === 0 && (
        <p className="px-3 pb-3 text-sm text-tide-600">
          {hidden > 0 ? `${hidden} hidden by the filters` : droppable ? 'No tasks. Drop a card here.' : 'No tasks.'}
        </p>
      )}
    </section>
  )
})
