import { QueryClientProvider } from '@tanstack/react-query'
import { useState } from 'react'
import { RouterProvider } from 'react-router-dom'
import { DeferredToaster } from '../components/ui/deferred-toaster'
import { authKeys } from '../features/auth/api/auth-queries'
import { LiveUpdatesProvider } from '../features/live/components/live-updates-provider'
import { forgetOfflineCopies } from '../features/round/api/offline-copies'
import { createQueryClient } from './query-client'
import { createRouter } from './router'

export function App() {
  const [queryClient] = useState(createQueryClient)
  const [router] = useState(() => createRouter(queryClient))
  return (
    <QueryClientProvider client={queryClient}>
      <LiveUpdatesProvider sessionKey={authKeys.me} onSignedOut={forgetOfflineCopies}>
        <RouterProvider router={router} />
      </LiveUpdatesProvider>
      <DeferredToaster />
    </QueryClientProvider>
  )
}
