import { QueryClientProvider } from '@tanstack/react-query'
import { useState } from 'react'
import { RouterProvider } from 'react-router-dom'
import { Toaster } from 'sonner'
import { authKeys } from '../features/auth/api/auth-queries'
import { LiveUpdatesProvider } from '../features/live/components/live-updates-provider'
import { forgetOfflineCopies } from '../features/round/api/offline-copies'
import { patchBoardTask } from '../features/board/api/board-cache'
import type { TaskEventHandler } from '../features/live/components/live-updates-provider'
import { upsertRoundTask } from '../features/round/api/round-cache'
import { createQueryClient } from './query-client'
import { createRouter } from './router'

// Each task view patches its own cache from a live task event; features stay apart, composed here.
const patchTaskViews: TaskEventHandler = (queryClient, task, personId) => {
  upsertRoundTask(queryClient, task, personId)
  patchBoardTask(queryClient, task)
}

export function App() {
  const [queryClient] = useState(createQueryClient)
  const [router] = useState(() => createRouter(queryClient))
  return (
    <QueryClientProvider client={queryClient}>
      <LiveUpdatesProvider sessionKey={authKeys.me} onTask={patchTaskViews} onSignedOut={forgetOfflineCopies}>
        <RouterProvider router={router} />
      </LiveUpdatesProvider>
      <Toaster position="top-center" richColors closeButton />
    </QueryClientProvider>
  )
}
