import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query'
import { useEffect } from 'react'
import { useSearchParams, type LoaderFunctionArgs } from 'react-router-dom'
import { authQueries } from '../../features/auth/api/auth-queries'
import { ConnectionIndicator } from '../../features/live/components/connection-indicator'
import { useLiveStatus } from '../../features/live/hooks/use-live-status'
import { roundQueries } from '../../features/round/api/round-queries'
import { RoundView } from '../../features/round/components/round-view'
import { flushOutbox } from '../../features/round/outbox/outbox-sender'

const dateFrom = (params: URLSearchParams) => {
  const date = params.get('date')
  return date && /^\d{4}-\d{2}-\d{2}$/.test(date) ? date : null
}

// Not awaited: the page shows its own loading, offline and error states instead of blocking navigation.
export const loader =
  (queryClient: QueryClient) =>
  ({ request }: LoaderFunctionArgs) => {
    void queryClient.prefetchQuery(roundQueries.day(dateFrom(new URL(request.url).searchParams)))
    return null
  }

export function Component() {
  const { data: me } = useSuspenseQuery(authQueries.me())
  const [params] = useSearchParams()
  const live = useLiveStatus()

  // Back on the live connection means the server is reachable: send what waited.
  useEffect(() => {
    if (live === 'live') void flushOutbox()
  }, [live])

  return <RoundView personId={me.id} date={dateFrom(params)} status={<ConnectionIndicator />} />
}
