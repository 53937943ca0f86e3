import { MutationCache, QueryCache, QueryClient } from '@tanstack/react-query'
import { ApiError } from '../lib/api-client'
import { toastError } from '../lib/toast'

/** Where the person was, or was going: a refused session comes back there after signing in. */
export interface Place {
  pathname: string
  search: string
}

/** Sends a refused session to sign-in; the app hands in its router so this stays a soft navigation. */
export type SendToSignIn = () => void

export function signInPathFrom(place: Place): string | null {
  if (place.pathname.startsWith('/sign-in')) return null
  return `/sign-in?redirectTo=${encodeURIComponent(place.pathname + place.search)}`
}

const reload: SendToSignIn = () => {
  const path = signInPathFrom(window.location)
  if (path) window.location.assign(path)
}

export function createQueryClient(sendToSignIn: SendToSignIn = reload) {
  return new QueryClient({
    defaultOptions: {
      queries: {
        staleTime: 30_000,
        // Ask anyway when the phone says it is offline: the service worker may hold an answer.
        networkMode: 'offlineFirst',
        retry: (count, error) => !(error instanceof ApiError && error.status >= 400 && error.status < 500) && count < 2,
      },
    },
    queryCache: new QueryCache({
      onError: (error, query) => {
        if (error instanceof ApiError && error.status === 401) return sendToSignIn()
        // Background refetch failed: keep the stale data on screen and say so once.
        if (query.state.data !== undefined) toastError(`Could not refresh: ${error.message}`)
      },
    }),
    mutationCache: new MutationCache({
      onError: (error, _variables, _context, mutation) => {
        if (error instanceof ApiError && error.status === 401) return sendToSignIn()
        if (error instanceof ApiError && error.code === 'validation_failed' && error.fieldErrors) return
        // The screen shows this error beside the control that failed; a toast would say it twice.
        if (mutation.meta?.errorShownInline) return
        toastError(error.message)
      },
    }),
  })
}
