import type { ReactNode } from 'react'
import { Notice } from './notice'

/** Where a calculator's answer goes: the figure, or what is missing or wrong in the inputs. */
export function ResultBox({ error, missing, children }: { error: string | null; missing: boolean; children: ReactNode }) {
  return (
    <div aria-live="polite">
      {missing ? (
        <Notice tone="info">Fill in the figures above to see the result.</Notice>
      ) : error ? (
        <Notice tone="watch">{error}</Notice>
      ) : (
        <div className="rounded-lg border border-tide-200 bg-tide-50 p-4">{children}</div>
      )}
    </div>
  )
}
