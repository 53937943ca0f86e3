import compression from 'compression'
import type { Request, RequestHandler, Response } from 'express'
import zlib from 'node:zlib'

const isApi = (req: Request) => req.path.startsWith('/api/')

/**
 * Two compressions. API answers are made for each request, so they get brotli's fastest level:
 * a 6,000-card board (about 580 kB of JSON) costs some 5× less time at quality 1 than at the
 * package's default 4, for about 36 kB on the wire instead of 11 kB. The client bundle and other
 * files keep the default, which trades more time for fewer bytes on a phone's first load.
 */
export function compress(): RequestHandler[] {
  const fast = compression({
    brotli: { params: { [zlib.constants.BROTLI_PARAM_QUALITY]: 1 } },
    filter: (req: Request, res: Response) => isApi(req) && compression.filter(req, res),
  })
  const thorough = compression({ filter: (req: Request, res: Response) => !isApi(req) && compression.filter(req, res) })
  return [fast, thorough]
}
