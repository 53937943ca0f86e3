/**
 * Runs `fn` once the browser has nothing more urgent to do (at the latest after `timeout` ms):
 * for work the first screen does not need, so it never competes with it. Returns a cancel.
 */
export function whenIdle(fn: () => void, timeout = 3000): () => void {
  if (window.requestIdleCallback) {
    const handle = window.requestIdleCallback(fn, { timeout })
    return () => window.cancelIdleCallback(handle)
  }
  const handle = window.setTimeout(fn, 1500)
  return () => window.clearTimeout(handle)
}
