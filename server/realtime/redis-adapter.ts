import { createAdapter } from '@socket.io/redis-adapter'
import { createClient } from 'redis'
import { logger } from '../lib/logger'

/**
 * socket.io's Redis adapter, so an event raised in one app process reaches sockets held by
 * the others. Only used when ROUNDTIDE_REDIS_URL is set; a single process needs no Redis.
 */
export async function createRedisAdapter(url: string) {
  const pub = createClient({ url })
  const sub = pub.duplicate()
  for (const client of [pub, sub]) client.on('error', (err) => logger.warn({ err }, 'redis connection problem'))
  await Promise.all([pub.connect(), sub.connect()])
  return {
    adapter: createAdapter(pub, sub),
    close: async () => {
      await Promise.allSettled([pub.quit(), sub.quit()])
    },
  }
}
