import { useSuspenseQuery } from '@tanstack/react-query'
import { useEffect } from 'react'
import { useSearchParams } from 'react-router-dom'
import { authQueries } from '../../features/auth/api/auth-queries'
import { ConnectionIndicator } from '../../features/live/components/connection-indicator'
import { useLiveStatus } from '../../features/live/hooks/use-live-status'
import { RoundView } from '../../features/round/components/round-view'
import { flushOutbox } from '../../features/round/outbox/outbox-sender'
import { dateFrom } from './round-loader'

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
