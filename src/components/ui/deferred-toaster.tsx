import { lazy, Suspense, useEffect, useState } from 'react'
import { loadSonner } from '../../lib/toast'
import { whenIdle } from '../../lib/when-idle'

const Toaster = lazy(() => loadSonner().then((m) => ({ default: m.Toaster })))

/** Mounts sonner's Toaster once the page is idle, so it never competes with the first screen. */
export function DeferredToaster() {
  const [ready, setReady] = useState(false)
  useEffect(() => whenIdle(() => setReady(true)), [])
  if (!ready) return null
  return (
    <Suspense fallback={null}>
      <Toaster position="top-center" richColors closeButton />
    </Suspense>
  )
}
