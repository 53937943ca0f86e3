/**
 * How a module announces a change that a module above it must act on, without importing that
 * module (which would make a cycle in the module graph, DEVELOPERS.md 13e). The module above
 * subscribes once at startup (`server/module-subscriptions.ts`); the announcing service awaits
 * every handler, so their writes join the caller's transaction (`db()` follows the async call).
 * Announcing with nobody subscribed is a wiring mistake, and throws rather than losing the work.
 */
export function moduleHook<Change>(name: string) {
  const handlers = new Set<(change: Change) => Promise<void>>()
  return {
    /** Idempotent: the app is built more than once in tests, and a handler must run once per change. */
    subscribe(handler: (change: Change) => Promise<void>) {
      handlers.add(handler)
    },
    async announce(change: Change) {
      if (!handlers.size) throw new Error(`Nobody subscribed to "${name}": call subscribeModules() where the process starts.`)
      for (const handler of handlers) await handler(change)
    },
  }
}
