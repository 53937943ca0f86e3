import { defaultRangeExtractor, useVirtualizer, type Range } from '@tanstack/react-virtual'
import { memo, useCallback, useRef, type ReactNode } from 'react'
import type { BoardCard } from '#shared/schemas/board'

/** Above this many cards a column draws only the ones in view (a full day holds thousands). */
export const WINDOW_FROM = 60

/** Where a windowed card sits; the card measures itself, since held or flagged cards are taller. */
export interface CardPlacement {
  index: number
  start: number
  measure: (el: Element | null) => void
}

interface Props {
  cards: BoardCard[]
  /** The card being dragged stays drawn even when scrolled out of view, so the drag keeps its source. */
  activeId: number | null
  renderCard: (task: BoardCard, placement?: CardPlacement) => ReactNode
}

const GAP = 8
const ESTIMATED_CARD = 96

/** A column's cards: all of them when few, a window of them inside a scroll box when many. Redrawn only when its props change. */
export const CardList = memo(function CardList({ cards, activeId, renderCard }: Props) {
  if (cards.length <= WINDOW_FROM) return <ul className="flex flex-1 flex-col gap-2 p-2">{cards.map((t) => renderCard(t))}</ul>
  return <WindowedCards cards={cards} activeId={activeId} renderCard={renderCard} />
})

/** Holds a not yet drawn column's place at about its drawn height, so the page does not jump when it is drawn. */
export function CardListPlaceholder({ count }: { count: number }) {
  if (count === 0) return null
  if (count > WINDOW_FROM) return <div aria-hidden className="h-[70vh]" />
  return <div aria-hidden style={{ height: count * (ESTIMATED_CARD + GAP) + GAP }} />
}

function WindowedCards({ cards, activeId, renderCard }: Props) {
  const scrollRef = useRef<HTMLDivElement>(null)
  const activeIndex = activeId === null ? -1 : cards.findIndex((t) => t.id === activeId)
  const rangeExtractor = useCallback(
    (range: Range) => {
      const shown = defaultRangeExtractor(range)
      return activeIndex < 0 || shown.includes(activeIndex) ? shown : [...shown, activeIndex].sort((a, b) => a - b)
    },
    [activeIndex],
  )
  const virtualizer = useVirtualizer({
    count: cards.length,
    getScrollElement: () => scrollRef.current,
    estimateSize: () => ESTIMATED_CARD,
    getItemKey: (i) => cards[i].id,
    overscan: 3,
    gap: GAP,
    paddingStart: GAP,
    paddingEnd: GAP,
    rangeExtractor,
  })
  return (
    // A scroll box of its own, so one long column does not stretch the page past the others;
    // focusable, so the keyboard can scroll it on a read-only board too.
    <div ref={scrollRef} className="max-h-[70vh] flex-1 overflow-y-auto overscroll-contain" tabIndex={0}>
      <ul className="relative" style={{ height: virtualizer.getTotalSize() }}>
        {virtualizer
          .getVirtualItems()
          .map((item) => renderCard(cards[item.index], { index: item.index, start: item.start, measure: virtualizer.measureElement }))}
      </ul>
    </div>
  )
}
