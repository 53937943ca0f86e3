// The service worker keeps the last round and person (vite.config.ts, runtime cache "roundtide-api")
// so the round opens offline; on a shared phone the next person must not be shown them.
export const OFFLINE_API_CACHE = 'roundtide-api'

export function forgetOfflineCopies() {
  if ('caches' in window) void caches.delete(OFFLINE_API_CACHE).catch(() => undefined)
}
