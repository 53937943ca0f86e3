import { useCallback, useMemo } from 'react'
import { useSearchParams } from 'react-router-dom'
import { readFilters, writeFilters, type BoardFilters } from '../utils/board-filters'

/** The board's filters live in the address, so a link or a reload shows the same board. */
export function useBoardParams() {
  const [params, setParams] = useSearchParams()
  const filters = useMemo(() => readFilters(params), [params])
  const setFilters = useCallback((next: BoardFilters) => setParams((current) => writeFilters(current, next), { replace: true }), [setParams])
  const hrefFor = useCallback(
    (date: string) => {
      const next = new URLSearchParams(params)
      next.set('date', date)
      return `/board?${next}`
    },
    [params],
  )
  return { filters, setFilters, hrefFor }
}
