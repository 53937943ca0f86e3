import { startTransition, useEffect, useState, type RefObject } from 'react'

/**
 * True once the element has come within `margin` of the viewport, and from then on. A full day
 * has dozens of columns (stacked on a phone, side by side in a scroller on a desk), and drawing
 * every column's cards up front is most of the board's first-load work; only those near the
 * viewport are needed. Without IntersectionObserver everything counts as near.
 */
export function useNearViewport(ref: RefObject<Element | null>, margin = '50% 0px'): boolean {
  const [near, setNear] = useState(() => typeof IntersectionObserver === 'undefined')
  useEffect(() => {
    const el = ref.current
    if (near || !el) return
    const observer = new IntersectionObserver(
      (entries) => {
        if (!entries.some((e) => e.isIntersecting)) return
        observer.disconnect()
        // A transition: React may yield while drawing the cards, and the page stays responsive.
        startTransition(() => setNear(true))
      },
      { rootMargin: margin },
    )
    observer.observe(el)
    return () => observer.disconnect()
  }, [ref, near, margin])
  return near
}
