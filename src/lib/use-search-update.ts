import { useSearchParams, type NavigateOptions } from 'react-router-dom'

/**
 * Merge changes into the page's query string; an empty value removes the key.
 * It merges into the live address, not the search params of the last render: a router
 * navigation commits its render in a transition, so a second change made right after a
 * first (pick dates, then a grouping) would otherwise be built on the old address and
 * silently undo the first.
 */
export function useSearchUpdate(options: NavigateOptions = {}) {
  const [, setSearch] = useSearchParams()
  return (changes: Record<string, string>) =>
    setSearch(() => {
      const next = new URLSearchParams(window.location.search)
      for (const [key, value] of Object.entries(changes)) {
        if (value) next.set(key, value)
        else next.delete(key)
      }
      return next
    }, options)
}
