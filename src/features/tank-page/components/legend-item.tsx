import type { ReactNode } from 'react'

/** One entry of a chart's key: a small drawing and what it means in words. */
export function LegendItem({ mark, children }: { mark: ReactNode; children: ReactNode }) {
  return (
    <li className="flex items-center gap-1.5">
      {mark}
      <span>{children}</span>
    </li>
  )
}
