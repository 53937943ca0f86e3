import type { Pool, RowDataPacket } from 'mysql2/promise'
import { floorPool } from './bench-db'
import { kb, log, ms, summary, timed, type Row } from './stats'

const REQUESTS = 200
const WARMUP = 5

// The floor: one query for the day's tasks with the names the board shows, no ORM, no HTTP.
const FLOOR_SQL = `SELECT t.*, a.name AS assigneeName, c.name AS completedByName
  FROM tasks t LEFT JOIN people a ON a.id = t.assigneeId LEFT JOIN people c ON c.id = t.completedById
  WHERE t.localDate = ? ORDER BY t.dueAt, t.id`

async function appBoard(url: string, cookie: string, date: string) {
  const res = await fetch(`${url}/api/tasks/board?date=${date}`, { headers: { cookie } })
  const body = await res.text()
  if (!res.ok) throw new Error(`board answered ${res.status}: ${body.slice(0, 120)}`)
  return body
}

async function floorBoard(pool: Pool, date: string) {
  const [rows] = await pool.query<RowDataPacket[]>(FLOOR_SQL, [date])
  const json = JSON.stringify(rows.map((r) => ({ ...r, requiredReadings: typeof r.requiredReadings === 'string' ? JSON.parse(r.requiredReadings) : r.requiredReadings })))
  return { rows: rows.length, json }
}

/**
 * Measurement 2: GET one day's board as a supervisor, against the same rows by one SQL query.
 * The two alternate, so both see the same machine state (GC, other load).
 */
export async function measureBoard(url: string, cookie: string, date: string): Promise<Row[]> {
  const pool = floorPool()
  const app: number[] = []
  const floor: number[] = []
  let bytes = 0
  let tasks = 0
  let floorRows = 0
  try {
    for (let i = 0; i < WARMUP + REQUESTS; i++) {
      const a = await timed(() => appBoard(url, cookie, date))
      const f = await timed(() => floorBoard(pool, date))
      if (i === 0) {
        bytes = Buffer.byteLength(a.value)
        tasks = (JSON.parse(a.value) as { tasks: unknown[] }).tasks.length
        floorRows = f.value.rows
      }
      if (i >= WARMUP) {
        app.push(a.ms)
        floor.push(f.ms)
      }
      if (i % 50 === 0) log(`board: ${i}/${WARMUP + REQUESTS} requests`)
    }
  } finally {
    await pool.end()
  }
  const s = summary(app)
  const t = summary(floor)
  const ratio = (x: number, y: number) => `${(x / y).toFixed(1)}×`
  return [
    { measurement: `2 board GET (${tasks} tasks)`, result: `p50 ${ms(s.p50)} / p95 ${ms(s.p95)} / p99 ${ms(s.p99)}`, detail: `${s.n} sequential requests as a supervisor for ${date}, ${kb(bytes)} JSON` },
    { measurement: '2 board floor (1 SQL + JSON)', result: `p50 ${ms(t.p50)} / p95 ${ms(t.p95)} / p99 ${ms(t.p99)}`, detail: `${floorRows} rows joined with people names through mysql2, JSON.stringify; alternating with the app` },
    { measurement: '2 board overhead app/floor', result: `p50 ${ratio(s.p50, t.p50)} / p95 ${ratio(s.p95, t.p95)} / p99 ${ratio(s.p99, t.p99)}`, detail: 'app time over floor time' },
  ]
}
