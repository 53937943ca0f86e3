import { lazy, Suspense, useEffect, useState } from 'react'
import { loadSonner } from '../../lib/toast'

const Toaster = lazy(() => loadSonner().then((m) => ({ default: m.Toaster })))

/** Mounts sonner's Toaster once the page is idle, so it never competes with the first screen. */
export function DeferredToaster() {
  const [ready, setReady] = useState(false)
  useEffect(() => {
    const whenIdle = window.requestIdleCallback ?? ((fn: () => void) => window.setTimeout(fn, 1500))
    const cancel = window.cancelIdleCallback ?? window.clearTimeout
    const handle = whenIdle(() => setReady(true), { timeout: 3000 })
    return () => cancel(handle)
  }, [])
  if (!ready) return null
  return (
    <Suspense fallback={null}>
      <Toaster position="top-center" richColors closeButton />
    </Suspense>
  )
}
