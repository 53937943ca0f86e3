import { useState } from 'react'
import type { BoardCard } from '#shared/schemas/board'
import { byColumn, keepUnchanged, type Columns } from '../utils/board-columns'

/**
 * The day's cards by column, recomputed when the day or the filters change, with unchanged columns
 * keeping their arrays from the last time (so their memoised columns skip the redraw).
 */
export function useBoardColumns(sorted: BoardCard[], visible: BoardCard[]): Columns {
  const [last, setLast] = useState(() => ({ sorted, visible, columns: byColumn(sorted, new Set(visible)) }))
  if (last.sorted === sorted && last.visible === visible) return last.columns
  // Derived from the previous render's columns, React's way: set during render, redrawn at once.
  const next = { sorted, visible, columns: keepUnchanged(byColumn(sorted, new Set(visible)), last.columns) }
  setLast(next)
  return next.columns
}
