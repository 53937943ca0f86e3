import type { Request, RequestHandler, Response } from 'express'
import type { QueryRunner } from 'typeorm'
import { crashPoint } from '../lib/crash-point'
import { logger } from '../lib/logger'
import { isDatabaseDown } from './database-errors'
import { dataSource, notifyCommitted, withAmbient, type AmbientTransaction } from './data-source'

const WRITES = new Set(['POST', 'PATCH', 'PUT', 'DELETE'])

/**
 * Runs every state-changing API request in one transaction: everything the route writes through
 * `db()` (its audit rows, follow-up tasks, alerts and outbox rows included) commits just before
 * the response goes out, or rolls back when the answer is an error, so a 4xx/5xx never leaves
 * half a change behind. `unwrapped` lists paths (relative to the router) that must not hold a
 * connection for their whole length: uploads that stream in, work that commits as it goes.
 */
export function requestTransaction(unwrapped: RegExp[]): RequestHandler {
  return (req, res, next) => {
    if (!WRITES.has(req.method) || unwrapped.some((path) => path.test(req.path))) return next()
    const runner = dataSource().createQueryRunner()
    startReadCommitted(runner).then(
      () => {
        const scope: AmbientTransaction = { manager: runner.manager, open: true }
        holdResponseUntilSettled(req, res, async (commit) => {
          scope.open = false
          try {
            if (commit) await runner.commitTransaction()
            else await runner.rollbackTransaction()
          } finally {
            await runner.release()
          }
          if (!commit) return
          crashPoint('after-commit', req.originalUrl)
          notifyCommitted()
        })
        withAmbient(scope, next)
      },
      async (err: unknown) => {
        await runner.release().catch(() => undefined)
        next(err)
      },
    )
  }
}

/** Pooled connections whose session already reads committed. */
const readCommittedConnections = new WeakSet<object>()

/**
 * Read committed: each statement sees what others committed (a lost race names its winner). Set
 * once per pooled connection for its session rather than before every transaction, which would
 * cost every write request one more round trip. Transactions that ask for another level still get it.
 */
async function startReadCommitted(runner: QueryRunner) {
  await readCommittedSession(runner)
  await runner.startTransaction()
}

/** Makes the runner's pooled connection read committed for good (once per connection); a statement run alone on it then reads committed too. */
export async function readCommittedSession(runner: QueryRunner) {
  const connection = (await runner.connect()) as object
  if (readCommittedConnections.has(connection)) return
  await runner.query('SET SESSION TRANSACTION ISOLATION LEVEL READ COMMITTED')
  readCommittedConnections.add(connection)
}

type End = Response['end']

/** Delays the response's `end` until the transaction is settled; a failed commit answers 500/503 instead. */
function holdResponseUntilSettled(req: Request, res: Response, settle: (commit: boolean) => Promise<void>) {
  const end = res.end.bind(res) as (...args: unknown[]) => Response
  let settling = false
  res.end = ((...args: unknown[]) => {
    if (settling) return end(...args)
    settling = true
    const commit = res.statusCode < 400
    settle(commit).then(
      () => end(...args),
      (err: unknown) => {
        if (!commit) {
          logger.warn({ err }, 'rollback failed')
          return end(...args)
        }
        const down = isDatabaseDown(err)
        logger.error({ err, requestId: String(req.id ?? '') }, 'commit failed')
        res.statusCode = down ? 503 : 500
        res.removeHeader('content-length')
        res.removeHeader('etag')
        res.setHeader('content-type', 'application/json; charset=utf-8')
        const message = down ? 'The database is not reachable just now. Please try again in a moment.' : 'Something went wrong on our side; nothing was saved.'
        end(JSON.stringify({ error: { code: down ? 'service_unavailable' : 'internal', message, requestId: String(req.id ?? '') } }))
      },
    )
    return res
  }) as End
}
