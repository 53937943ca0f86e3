import { useQueryClient, type QueryKey } from '@tanstack/react-query'
import { useEffect, useRef, useState, type ReactNode } from 'react'
import type { Socket } from 'socket.io-client'
import { DataChangedEventSchema, LIVE_EVENTS, TasksUpdatedEventSchema } from '#shared/schemas/live'
import { refetchChangedKinds } from '../../../api/live-changes'
import { whenIdle } from '../../../lib/when-idle'
import { patchTaskViews, refetchTaskViews } from '../../../api/tasks/task-cache'
import { LiveStatusContext, type LiveStatus } from '../hooks/use-live-status'
import { useSessionPersonId } from '../hooks/use-session-person-id'

interface Props {
  /** The query holding the signed-in person; the socket is open only while it has data. */
  sessionKey: QueryKey
  /** Runs when the signed-in person signs out (e.g. to forget copies kept for offline use). */
  onSignedOut?: () => void
  children: ReactNode
}

/** One socket per signed-in person; changed tasks patch the caches in place, other changes and a reconnect refetch once. */
export function LiveUpdatesProvider({ sessionKey, onSignedOut, children }: Props) {
  const queryClient = useQueryClient()
  const personId = useSessionPersonId(sessionKey)
  const [state, setState] = useState<{ personId: number | null; status: LiveStatus }>({ personId: null, status: 'connecting' })
  const onSignedOutRef = useRef(onSignedOut)
  const lastPersonId = useRef<number | null>(null)
  useEffect(() => {
    onSignedOutRef.current = onSignedOut
  }, [onSignedOut])

  useEffect(() => {
    if (personId === null && lastPersonId.current !== null) onSignedOutRef.current?.()
    lastPersonId.current = personId
  }, [personId])

  useEffect(() => {
    if (personId === null) return
    // socket.io-client loads once the page is idle: the page needs its code and data first, live changes next.
    let cancelled = false
    let teardown: (() => void) | undefined
    let failedLoads = 0
    // The code can fail to arrive (the phone went offline before the page was idle): try again when
    // the network is back, or live changes would never start on this page.
    const retryLoad = () => !cancelled && load()
    const load = () =>
      void import('../api/socket-client').then(
        ({ createLiveSocket }) => {
          if (!cancelled) teardown = connect(createLiveSocket(), failedLoads > 0)
        },
        () => {
          if (cancelled) return
          failedLoads++
          setState({ personId, status: 'offline' })
          window.addEventListener('online', retryLoad, { once: true })
        },
      )
    const cancelLoad = whenIdle(load)
    /** `late`: the socket comes after a failed load, so changes made meanwhile were never heard. */
    const connect = (socket: Socket, late: boolean) => {
      const report = (status: LiveStatus) => setState({ personId, status })
      let missed = late
      const lost = () => {
        missed = true
        report(navigator.onLine ? 'reconnecting' : 'offline')
      }
      socket.on(LIVE_EVENTS.tasksUpdated, (payload: unknown) => {
        const parsed = TasksUpdatedEventSchema.safeParse(payload)
        if (!parsed.success) return
        for (const task of parsed.data.tasks) patchTaskViews(queryClient, task, personId)
      })
      // Bulk changes (a roster change re-assigning, a routine re-planned) come without tasks: refetch once.
      socket.on(LIVE_EVENTS.tasksChanged, () => void refetchTaskViews(queryClient))
      socket.on(LIVE_EVENTS.dataChanged, (payload: unknown) => {
        const parsed = DataChangedEventSchema.safeParse(payload)
        if (parsed.success) void refetchChangedKinds(queryClient, parsed.data.kinds)
      })
      socket.on('connect', () => {
        report('live')
        // What changed while we were away came as events nobody heard: catch up once.
        if (missed) void refetchTaskViews(queryClient)
        missed = false
      })
      socket.on('disconnect', (reason) => {
        lost()
        // The server closes a session's sockets when it ends (signed out elsewhere, person disabled):
        // asking who is signed in then meets the refusal that sends this page to sign in.
        if (reason === 'io server disconnect') void queryClient.invalidateQueries({ queryKey: sessionKey })
      })
      socket.on('connect_error', lost)
      const onOffline = () => {
        // The socket may not notice a dead network until its ping times out; the browser knows sooner.
        missed = true
        report('offline')
      }
      const onOnline = () => {
        if (socket.connected) {
          report('live')
          void refetchTaskViews(queryClient)
          missed = false
          return
        }
        report('reconnecting')
        // Skip the back-off wait: the network is back now.
        socket.disconnect().connect()
      }
      window.addEventListener('offline', onOffline)
      window.addEventListener('online', onOnline)
      socket.connect()
      return () => {
        window.removeEventListener('offline', onOffline)
        window.removeEventListener('online', onOnline)
        socket.removeAllListeners()
        socket.disconnect()
      }
    }
    return () => {
      cancelled = true
      cancelLoad()
      window.removeEventListener('online', retryLoad)
      teardown?.()
    }
  }, [personId, queryClient, sessionKey])

  const status: LiveStatus = personId === null ? 'signed-out' : state.personId === personId ? state.status : 'connecting'
  return <LiveStatusContext.Provider value={status}>{children}</LiveStatusContext.Provider>
}
