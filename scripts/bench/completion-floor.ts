import { randomUUID } from 'node:crypto'
import type { Pool, PoolConnection, ResultSetHeader } from 'mysql2/promise'
import { floorPool } from './bench-db'
import { openReadingTaskIds } from './open-tasks'
import { ms, summary, type Row } from './stats'

const CLIENTS = 50
const POOL = 20

/**
 * The rows one completion writes (the task claimed, the completion, two readings), by one
 * hand-written transaction: no HTTP, no session, no judging, no ORM. Same pool size as the app.
 */
async function completeByHand(conn: PoolConnection, taskId: number, personId: number, n: number) {
  const id = randomUUID()
  const now = new Date()
  await conn.beginTransaction()
  try {
    const [claimed] = await conn.execute<ResultSetHeader>(
      "UPDATE tasks SET status = 'done', flag = NULL, lateMinutes = NULL, completedAt = ?, completedById = ?, assigneeId = COALESCE(assigneeId, ?), version = version + 1 WHERE id = ? AND status NOT IN ('done', 'skipped')",
      [now, personId, personId, taskId],
    )
    if (!claimed.affectedRows) throw new Error(`task ${taskId} was already finished`)
    await conn.execute("INSERT INTO completions (id, taskId, personId, outcome, doneAt) VALUES (?, ?, ?, 'done', ?)", [id, taskId, personId, now])
    await conn.execute(
      "INSERT INTO readings (completionId, taskId, parameterKey, value, unit, band, takenAt, personId) VALUES (?, ?, 'do_mgL', ?, 'mg/L', 'ok', ?, ?), (?, ?, 'temp_c', ?, '°C', 'ok', ?, ?)",
      [id, taskId, 6 + (n % 20) / 10, now, personId, id, taskId, 27 + (n % 20) / 10, now, personId],
    )
    await conn.commit()
  } catch (err) {
    await conn.rollback()
    throw err
  }
}

/** Measurement 3 floor: the same number of completions as the app did, from 50 concurrent callers. */
export async function measureCompletionFloor(date: string, amount: number, personId: number): Promise<{ row: Row; perSecond: number; p95: number }> {
  const ids = (await openReadingTaskIds(date)).slice(0, amount)
  const pool: Pool = floorPool(POOL)
  const latencies: number[] = []
  let next = 0
  const start = performance.now()
  try {
    await Promise.all(
      Array.from({ length: CLIENTS }, async () => {
        while (next < ids.length) {
          const n = next++
          const t = performance.now()
          const conn = await pool.getConnection()
          try {
            await completeByHand(conn, ids[n], personId, n)
          } finally {
            conn.release()
          }
          latencies.push(performance.now() - t)
        }
      }),
    )
  } finally {
    await pool.end()
  }
  const seconds = (performance.now() - start) / 1000
  const s = summary(latencies)
  const perSecond = latencies.length / seconds
  return {
    perSecond,
    p95: s.p95,
    row: {
      measurement: `3 completions floor (1 mysql2 transaction), ${CLIENTS} callers`,
      result: `${perSecond.toFixed(0)} completions/s, p95 ${ms(s.p95)}`,
      detail: `${latencies.length} transactions on ${date} (UPDATE task, INSERT completion, INSERT 2 readings, COMMIT; pool of ${POOL}); p50 ${ms(s.p50)}, p99 ${ms(s.p99)}`,
    },
  }
}
