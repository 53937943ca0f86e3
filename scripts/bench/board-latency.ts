import http from 'node:http'
import type { Pool, RowDataPacket } from 'mysql2/promise'
import { floorPool } from './bench-db'
import { kb, log, ms, summary, timed, type Row } from './stats'

const REQUESTS = 200
const WARMUP = 5
const P50_GOAL_MS = 60
const RATIO_GOAL = 1.3
const PAYLOAD_GOAL = 600 * 1024
const BROWSER_ENCODINGS = 'gzip, deflate, br'

// The floor: one query for the day's cards with what a card draws (the assignee's name joined,
// the target's label from the tank), no ORM, no HTTP, no session, no compression.
const FLOOR_SQL = `SELECT t.id, t.title, t.category, t.priority, t.durationMinutes, t.targetKind, t.targetId, t.tankId, t.areaId,
  SUBSTRING(t.localStart, 12, 5) AS time, t.status, t.assigneeId, a.name AS assigneeName, t.flag, t.heldReason, t.version,
  CONCAT(k.code, ' · ', k.name) AS targetLabel
  FROM tasks t LEFT JOIN people a ON a.id = t.assigneeId LEFT JOIN tanks k ON k.id = t.tankId
  WHERE t.localDate = ? ORDER BY t.dueAt, t.id`

/** One request as a browser sends it, counting the bytes on the wire and naming the encoding. */
function wireSize(url: string, cookie: string, date: string) {
  return new Promise<{ bytes: number; encoding: string }>((resolve, reject) => {
    const req = http.get(`${url}/api/tasks/board?date=${date}`, { headers: { cookie, 'accept-encoding': BROWSER_ENCODINGS } }, (res) => {
      let bytes = 0
      res.on('data', (chunk: Buffer) => (bytes += chunk.length))
      res.on('end', () => resolve({ bytes, encoding: String(res.headers['content-encoding'] ?? 'identity') }))
      res.on('error', reject)
    })
    req.on('error', reject)
  })
}

async function appBoard(url: string, cookie: string, date: string) {
  // Asks for what Chromium asks for; Node's fetch alone offers only gzip and deflate, which a browser never gets.
  const res = await fetch(`${url}/api/tasks/board?date=${date}`, { headers: { cookie, 'accept-encoding': BROWSER_ENCODINGS } })
  const body = await res.text()
  if (!res.ok) throw new Error(`board answered ${res.status}: ${body.slice(0, 120)}`)
  return body
}

async function floorBoard(pool: Pool, date: string) {
  const [rows] = await pool.query<RowDataPacket[]>(FLOOR_SQL, [date])
  const json = JSON.stringify(rows)
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
        tasks = (JSON.parse(a.value) as { cards: { id: unknown[] } }).cards.id.length
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
  const wire = await wireSize(url, cookie, date)
  const s = summary(app)
  const t = summary(floor)
  const ratio = (x: number, y: number) => `${(x / y).toFixed(2)}×`
  const met = (ok: boolean) => (ok ? 'met' : 'NOT met')
  return [
    {
      measurement: `2 board GET (${tasks} tasks)`,
      result: `p50 ${ms(s.p50)} / p95 ${ms(s.p95)} / p99 ${ms(s.p99)} (p50 goal ≤ ${P50_GOAL_MS} ms: ${met(s.p50 <= P50_GOAL_MS)})`,
      detail: `${s.n} sequential requests as a supervisor for ${date} (fetch asking gzip, deflate, br as Chromium does; compressed and unpacked), alternating with the floor`,
    },
    {
      measurement: '2 board payload',
      result: `${kb(bytes)} JSON, ${kb(wire.bytes)} ${wire.encoding} (goal ≤ ${kb(PAYLOAD_GOAL)}: ${met(bytes <= PAYLOAD_GOAL)})`,
      detail: 'before compression, and on the wire for a browser asking br, gzip',
    },
    {
      measurement: '2 board floor (1 SQL + JSON)',
      result: `p50 ${ms(t.p50)} / p95 ${ms(t.p95)} / p99 ${ms(t.p99)}`,
      detail: `${floorRows} rows with the columns a card draws, names and tank labels joined, through mysql2, JSON.stringify`,
    },
    {
      measurement: '2 board app/floor',
      result: `p50 ${ratio(s.p50, t.p50)} / p95 ${ratio(s.p95, t.p95)} / p99 ${ratio(s.p99, t.p99)} (p50 goal ≤ ${RATIO_GOAL}×: ${met(s.p50 / t.p50 <= RATIO_GOAL)})`,
      detail: 'app time over floor time; the app adds HTTP, the session, compression and the catalogue',
    },
  ]
}
