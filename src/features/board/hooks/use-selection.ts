import { useCallback, useState } from 'react'

/** Cards picked to move together. */
export function useSelection() {
  const [selected, setSelected] = useState<ReadonlySet<number>>(() => new Set())
  const toggle = useCallback((id: number) => {
    setSelected((current) => {
      const next = new Set(current)
      if (!next.delete(id)) next.add(id)
      return next
    })
  }, [])
  const clear = useCallback(() => setSelected(new Set()), [])
  return { selected, toggle, clear }
}
