import { QueryClientProvider } from '@tanstack/react-query'
import { useState } from 'react'
import { RouterProvider } from 'react-router-dom'
import { DeferredToaster } from '../components/ui/deferred-toaster'
import { authKeys } from '../features/auth/api/auth-queries'
import { LiveUpdatesProvider } from '../features/live/components/live-updates-provider'
import { forgetOfflineCopies } from '../features/round/api/offline-copies'
import { createQueryClient, signInPathFrom } from './query-client'
import { createRouter } from './router'

export function App() {
  const [{ queryClient, router }] = useState(() => {
    // The query client needs the router to send a refused session to sign-in, and the router needs its data.
    const late: { router?: ReturnType<typeof createRouter> } = {}
    const queryClient = createQueryClient(() => {
      const router = late.router
      if (!router) return
      // A refusal met while loading the next page returns to that page, not the one being left.
      const path = signInPathFrom(router.state.navigation.location ?? router.state.location)
      if (path) void router.navigate(path, { replace: true })
    })
    late.router = createRouter(queryClient)
    return { queryClient, router: late.router }
  })
  return (
    <QueryClientProvider client={queryClient}>
      <LiveUpdatesProvider sessionKey={authKeys.me} onSignedOut={forgetOfflineCopies}>
        <RouterProvider router={router} />
      </LiveUpdatesProvider>
      <DeferredToaster />
    </QueryClientProvider>
  )
}
