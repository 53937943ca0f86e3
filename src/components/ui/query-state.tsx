import type { UseQueryResult } from '@tanstack/react-query'
import type { ReactNode } from 'react'
import { Button } from './button'
import { ErrorState, LoadingState } from './page-state'

/**
 * One part of a page that loads on its own: loading, offline (no copy on this device yet) or
 * failed with a retry, and only then its content, so the rest of the page keeps working.
 */
export function QueryState({ queries, what, children }: { queries: UseQueryResult[]; what: string; children: () => ReactNode }) {
  const missing = queries.filter((q) => q.data === undefined)
  if (missing.length === 0) return <>{children()}</>
  const failed = missing.find((q) => q.isError)
  if (failed) {
    const retry = (
      <Button variant="secondary" onClick={() => missing.forEach((q) => void q.refetch())}>
        Try again
      </Button>
    )
    return <ErrorState title={`Could not load ${what}`} message={failed.error?.message ?? 'The server did not answer.'} action={retry} />
  }
  if (missing.some((q) => q.fetchStatus === 'paused') || (typeof navigator !== 'undefined' && !navigator.onLine)) {
    return <ErrorState title="You are offline" message={`There is no copy of ${what} on this device yet. It loads when the connection is back.`} />
  }
  return <LoadingState label={`Loading ${what}…`} />
}
