import compression from 'compression'
import type { Request, RequestHandler } from 'express'
import zlib from 'node:zlib'

const isApi = (req: Request) => req.path.startsWith('/api/')

/**
 * Two compressions. API answers are made for each request, so they get brotli's fastest level:
 * a 6,000-card board (about 580 kB of JSON) costs some 5× less time at quality 1 than at the
 * package's default 4, for about 36 kB on the wire instead of 11 kB. The client bundle and other
 * files keep the default, which trades more time for fewer bytes on a phone's first load.
 * Each request passes through only its own compressor: each wraps the response's writes and headers
 * before it knows whether it will compress, and two wrappings cost every answer twice (record 16h).
 */
export function compress(): RequestHandler {
  const fast = compression({ brotli: { params: { [zlib.constants.BROTLI_PARAM_QUALITY]: 1 } } })
  const thorough = compression()
  return (req, res, next) => (isApi(req) ? fast(req, res, next) : thorough(req, res, next))
}
