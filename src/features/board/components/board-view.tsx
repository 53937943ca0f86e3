import { DndContext, DragOverlay } from '@dnd-kit/core'
import { useCallback, useMemo } from 'react'
import type { Board, BoardCard } from '#shared/schemas/board'
import type { Area } from '#shared/schemas/facility'
import { FINISHED_STATUSES } from '#shared/schemas/task'
import { byTime } from '../../../api/tasks/board-cache'
import { useBoardColumns } from '../hooks/use-board-columns'
import { useBoardDnd } from '../hooks/use-board-dnd'
import { useBoardParams } from '../hooks/use-board-params'
import { useSelection } from '../hooks/use-selection'
import { isFiltered, matchesFilters } from '../utils/board-filters'
import { BoardColumn } from './board-column'
import type { CardPlacement } from './card-list'
import { BoardFiltersBar } from './board-filters'
import { DateNav } from './date-nav'
import { DragPreview } from './drag-preview'
import { ReadOnlyNote } from './read-only-note'
import { SelectionBar } from './selection-bar'
import { TaskCard } from './task-card'
import { WeekStrip } from './week-strip'

interface Props {
  board: Board
  areas: Area[]
  /** The facility's today, so past days refuse drops before the server has to. */
  today: string
  canEdit: boolean
}

const EMPTY = { all: [], shown: [] }

export function BoardView({ board, areas, today, canEdit }: Props) {
  const { filters, setFilters, hrefFor } = useBoardParams()
  const { selected, toggle, clear } = useSelection()
  const sorted = useMemo(() => [...board.tasks].sort(byTime), [board.tasks])
  const visible = useMemo(() => sorted.filter((t) => matchesFilters(t, filters)), [sorted, filters])
  const columns = useBoardColumns(sorted, visible)
  const { contextProps, active, movingCount } = useBoardDnd({ date: board.date, visible, selected, clearSelection: clear })
  const selectedShown = visible.filter((t) => selected.has(t.id)).length

  const column = (assigneeId: number | null) => columns.get(assigneeId) ?? EMPTY
  // Stable across a drag, so the memoised columns and cards it does not touch are not drawn again.
  const renderCard = useCallback(
    (t: BoardCard, placement?: CardPlacement) => (
      <TaskCard
        key={t.id}
        task={t}
        movable={canEdit && !FINISHED_STATUSES.includes(t.status)}
        selected={selected.has(t.id)}
        onToggle={toggle}
        index={placement?.index}
        start={placement?.start}
        measure={placement?.measure}
      />
    ),
    [canEdit, selected, toggle],
  )
  // Only the column the dragged card comes from keeps it drawn; the others get null and skip the redraw.
  const activeIn = (assigneeId: number | null) => (active && active.assigneeId === assigneeId ? active.id : null)
  const unassigned = column(null)

  return (
    <DndContext {...contextProps}>
      <div className="flex flex-col gap-3">
        <div className="flex flex-wrap items-end justify-between gap-3">
          <DateNav date={board.date} today={today} hrefFor={hrefFor} />
          <BoardFiltersBar areas={areas} value={filters} onChange={setFilters} />
        </div>
        <WeekStrip date={board.date} today={today} canMove={canEdit} dragging={active !== null} hrefFor={hrefFor} />
        {!canEdit && <ReadOnlyNote />}
        {canEdit && selectedShown > 0 && <SelectionBar count={selectedShown} onClear={clear} />}
        {isFiltered(filters) && (
          <p className="text-sm text-tide-700">
            Showing {visible.length} of {board.tasks.length} tasks on this day.
          </p>
        )}
        {board.people.length === 0 && (
          <p className="text-sm text-tide-700">Nobody is on shift on this day yet. Add shifts on the roster to give people a column here.</p>
        )}
        <div className="flex flex-col gap-3 md:flex-row md:items-stretch md:overflow-x-auto md:pb-2">
          <BoardColumn person={null} allTasks={unassigned.all} shown={unassigned.shown} droppable={canEdit} activeId={activeIn(null)} renderCard={renderCard} />
          {board.people.map((person) => {
            const own = column(person.personId)
            return (
              <BoardColumn
                key={person.personId}
                person={person}
                allTasks={own.all}
                shown={own.shown}
                droppable={canEdit}
                activeId={activeIn(person.personId)}
                renderCard={renderCard}
              />
            )
          })}
        </div>
      </div>
      <DragOverlay dropAnimation={null}>{active && <DragPreview task={active} count={movingCount} />}</DragOverlay>
    </DndContext>
  )
}
