import { randomUUID } from 'node:crypto'
import { db } from '#server/db/data-source'

/** Open routine tasks of a day that need DO and temperature, in id order. */
export async function openReadingTaskIds(date: string): Promise<number[]> {
  const rows: Array<{ id: number; requiredReadings: string | string[] }> = await db().query(
    "SELECT id, requiredReadings FROM tasks WHERE localDate = ? AND status = 'planned' AND routineId IS NOT NULL ORDER BY id",
    [date],
  )
  const needs = (r: string | string[]) => {
    const keys = typeof r === 'string' ? (JSON.parse(r) as string[]) : r
    return keys.length === 2 && keys.includes('do_mgL') && keys.includes('temp_c')
  }
  return rows.filter((r) => needs(r.requiredReadings)).map((r) => Number(r.id))
}

/** A completion body with in-range readings (a flag would add a recheck and an alert to the work). */
export function completionBody(n: number) {
  return JSON.stringify({ completionId: randomUUID(), readings: { do_mgL: 6 + (n % 20) / 10, temp_c: 27 + (n % 20) / 10 } })
}
