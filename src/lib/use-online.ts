import { useSyncExternalStore } from 'react'

function subscribe(onChange: () => void) {
  window.addEventListener('online', onChange)
  window.addEventListener('offline', onChange)
  return () => {
    window.removeEventListener('online', onChange)
    window.removeEventListener('offline', onChange)
  }
}

/** The browser's own idea of being online; a "true" can still meet a dead network, which the outbox handles. */
export const useOnline = () => useSyncExternalStore(subscribe, () => navigator.onLine)
