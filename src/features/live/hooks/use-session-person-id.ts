import { useQueryClient, type QueryKey } from '@tanstack/react-query'
import { useCallback, useSyncExternalStore } from 'react'
import { hashKey } from '@tanstack/react-query'

/** The signed-in person's id, read from the cached session query (null once signed out or cleared). */
export function useSessionPersonId(sessionKey: QueryKey): number | null {
  const queryClient = useQueryClient()
  const hash = hashKey(sessionKey)
  const subscribe = useCallback(
    (onChange: () => void) => queryClient.getQueryCache().subscribe((event) => event.query.queryHash === hash && onChange()),
    [queryClient, hash],
  )
  return useSyncExternalStore(subscribe, () => queryClient.getQueryData<{ id?: number }>(sessionKey)?.id ?? null)
}
