import type { Express } from 'express'

interface StackLayer {
  route?: { path: string; methods: Record<string, boolean> }
  rawPath?: string
  handle?: { stack?: StackLayer[] }
}

const join = (a: string, b: string) => `${a}/${b}`.replace(/\/+/g, '/').replace(/(.)\/$/, '$1')

/** Every method and path the app answers, read from Express's own router (so a new route shows up here). */
export function listRoutes(app: Express): Array<{ method: string; path: string }> {
  const out: Array<{ method: string; path: string }> = []
  const walk = (stack: StackLayer[], prefix: string) => {
    for (const layer of stack) {
      if (layer.route) {
        for (const m of Object.keys(layer.route.methods)) if (m !== '_all') out.push({ method: m.toUpperCase(), path: join(prefix, layer.route.path) })
      } else if (layer.handle?.stack) {
        walk(layer.handle.stack, typeof layer.rawPath === 'string' ? join(prefix, layer.rawPath) : prefix)
      }
    }
  }
  walk((app as unknown as { router: { stack: StackLayer[] } }).router.stack, '')
  return out
}
