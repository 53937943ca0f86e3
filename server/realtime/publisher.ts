import { randomUUID } from 'node:crypto'
import { In, IsNull, LessThan } from 'typeorm'
import { LIVE_EVENTS, type ChangeKind, type DataChangedEvent, type TasksChangedEvent, type TasksUpdatedEvent } from '#shared/schemas/live'
import { dataSource, onCommitted } from '../db/data-source'
import { readCommittedSession } from '../db/request-transaction'
import { crashPoint } from '../lib/crash-point'
import { logger } from '../lib/logger'
import { getTasks } from '../modules/tasks/tasks.service'
import { ChangeOutboxEntity, type ChangeRow } from './change-outbox.entity'
import { broadcast } from './socket-server'

/** Outbox rows taken per pass. */
const CLAIM_BATCH = 1000
/** Tasks per socket event. */
const TASKS_PER_EVENT = 200
/** More changed tasks than this in one pass: clients refetch instead of receiving them all. */
const MAX_TASKS_SENT = 2000
/** A claim older than this belongs to a publisher that died before marking its rows published. */
const CLAIM_LEASE_SECONDS = 15
const KEEP_PUBLISHED_MS = 24 * 3_600_000
/** Published rows are cleared out at most this often, not on every pass (a busy minute has thousands of passes). */
const CLEAR_EVERY_MS = 60_000
let clearedAt = 0
/**
 * Under load a commit lands while every pass runs, so passes ran back to back, each for the few
 * changes of its own few milliseconds and four round trips. A pass that follows another starts no
 * sooner than this after it (record 16h); the first change after a quiet spell still goes at once.
 */
const PASS_SPACING_MS = 25

export interface PublisherOptions {
  /** The safety net besides the kick after every commit (changes written by another process). */
  intervalMs?: number
}

/**
 * The one sender of live events (record 13c). After every commit, on an interval and at start-up
 * (what a killed process committed but never sent) it claims unpublished outbox rows, sends them
 * as batched socket events and marks them published.
 */
export function startPublisher({ intervalMs = 2000 }: PublisherOptions = {}) {
  let running: Promise<void> | null = null
  let again = false
  let stopped = false
  let started = false
  let lastStart = 0
  let spaced: NodeJS.Timeout | undefined
  const run = (): Promise<void> => {
    if (stopped || !started) return Promise.resolve()
    if (running) {
      again = true
      return running
    }
    clearTimeout(spaced)
    spaced = undefined
    lastStart = Date.now()
    running = drain()
      .catch((err: unknown) => logger.warn({ err }, 'live events not published yet; will retry'))
      .finally(() => {
        running = null
        if (again && !stopped) {
          again = false
          kick()
        }
      })
    return running
  }
  /** A change committed: a pass now, or once the spacing after the last one has passed (it takes every change until then). */
  const kick = () => {
    if (running) {
      again = true
      return
    }
    if (spaced || stopped) return
    const wait = lastStart + PASS_SPACING_MS - Date.now()
    if (wait <= 0) return void run()
    spaced = setTimeout(() => {
      spaced = undefined
      void run()
    }, wait)
  }
  // Off the response path: the request has its answer before the events go.
  const stopListening = onCommitted(() => setImmediate(kick))
  // The first pass, one interval after start, sends what a killed process committed but never
  // sent (and what committed since): by then the clients of the process are listening again.
  let timer: NodeJS.Timeout | undefined
  const firstPass = setTimeout(() => {
    started = true
    timer = setInterval(() => void run(), intervalMs)
    void run()
  }, intervalMs)
  return {
    publishNow: run,
    async stop() {
      stopped = true
      clearTimeout(firstPass)
      clearTimeout(spaced)
      clearInterval(timer)
      stopListening()
      await running
    },
  }
}

async function drain() {
  while ((await publishBatch()) === CLAIM_BATCH);
  if (Date.now() - clearedAt < CLEAR_EVERY_MS) return
  clearedAt = Date.now()
  await dataSource()
    .getRepository(ChangeOutboxEntity)
    .delete({ publishedAt: LessThan(new Date(Date.now() - KEEP_PUBLISHED_MS)) })
}

/** Claims, sends and marks one batch; answers how many rows it took. */
export async function publishBatch(): Promise<number> {
  const ds = dataSource()
  const token = randomUUID()
  // Claimed before sending (as escalation messages are, record 009): two processes never send a
  // row twice. Read committed, so the claim passes over rows of transactions still open (a long
  // scheduler tick) instead of waiting for them; the next pass takes those.
  // One statement commits on its own: run alone on a read-committed connection, not inside a
  // transaction (SET TRANSACTION, START, COMMIT: three round trips more per pass; record 16h).
  const runner = ds.createQueryRunner()
  try {
    await readCommittedSession(runner)
    await runner.query(
      'UPDATE change_outbox SET claimedBy = ?, claimedAt = NOW(3) WHERE publishedAt IS NULL AND (claimedAt IS NULL OR claimedAt < NOW(3) - INTERVAL ? SECOND) ORDER BY id LIMIT ?',
      [token, CLAIM_LEASE_SECONDS, CLAIM_BATCH],
    )
  } finally {
    await runner.release()
  }
  const repo = ds.getRepository(ChangeOutboxEntity)
  const rows = await repo.find({ where: { claimedBy: token, publishedAt: IsNull() }, order: { id: 'ASC' } })
  if (!rows.length) return 0
  crashPoint('after-claim', rows.map((r) => `${r.kind}:${r.entityId}`).join(' '))
  await send(rows)
  await repo.update({ id: In(rows.map((r) => r.id)), claimedBy: token, publishedAt: IsNull() }, { publishedAt: new Date() })
  return rows.length
}

async function send(rows: ChangeRow[]) {
  const taskIds = [...new Set(rows.filter((r) => r.kind === 'task').map((r) => Number(r.entityId)))]
  const reasons = [...new Set(rows.filter((r) => r.kind === 'tasks').map((r) => r.entityId ?? 'changed'))]
  const kinds = [...new Set(rows.map((r) => r.kind).filter((k): k is Exclude<ChangeKind, 'task' | 'tasks'> => k !== 'task' && k !== 'tasks'))]
  if (taskIds.length > MAX_TASKS_SENT) reasons.push('many')
  if (reasons.length) {
    broadcast(LIVE_EVENTS.tasksChanged, { reasons } satisfies TasksChangedEvent)
  } else if (taskIds.length) {
    const tasks = await getTasks(taskIds)
    for (let i = 0; i < tasks.length; i += TASKS_PER_EVENT)
      broadcast(LIVE_EVENTS.tasksUpdated, { tasks: tasks.slice(i, i + TASKS_PER_EVENT) } satisfies TasksUpdatedEvent)
  }
  if (kinds.length) broadcast(LIVE_EVENTS.dataChanged, { kinds } satisfies DataChangedEvent)
}
