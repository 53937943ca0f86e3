import type { BoardCard } from '#shared/schemas/board'

/** A column's cards: all of them (for the header's totals) and those the filters show. */
export interface ColumnCards {
  all: BoardCard[]
  shown: BoardCard[]
}
export type Columns = Map<number | null, ColumnCards>

/** Each column's cards, all and after the filters, in one pass over the day (in the day's order). */
export function byColumn(all: BoardCard[], shown: ReadonlySet<BoardCard>): Columns {
  const columns: Columns = new Map()
  for (const t of all) {
    let c = columns.get(t.assigneeId)
    if (!c) columns.set(t.assigneeId, (c = { all: [], shown: [] }))
    c.all.push(t)
    if (shown.has(t)) c.shown.push(t)
  }
  return columns
}

const sameCards = (a: BoardCard[], b: BoardCard[]) => a.length === b.length && a.every((t, i) => t === b[i])

/**
 * The new columns, each keeping the previous arrays where its cards are the same ones in the same
 * order: a move or a live update then hands new cards only to the columns it changed, and the
 * other (memoised) columns are not drawn again.
 */
export function keepUnchanged(next: Columns, previous: Columns): Columns {
  for (const [id, c] of next) {
    const old = previous.get(id)
    if (!old) continue
    const all = sameCards(old.all, c.all) ? old.all : c.all
    const shown = sameCards(old.shown, c.shown) ? old.shown : c.shown
    next.set(id, all === old.all && shown === old.shown ? old : { all, shown })
  }
  return next
}
