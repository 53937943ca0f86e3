import { MutationCache, QueryCache, QueryClient } from '@tanstack/react-query'
import { ApiError } from '../lib/api-client'
import { toastError } from '../lib/toast'

function sendToSignIn() {
  const here = window.location.pathname + window.location.search
  if (!window.location.pathname.startsWith('/sign-in')) {
    window.location.assign(`/sign-in?redirectTo=${encodeURIComponent(here)}`)
  }
}

export function createQueryClient() {
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
