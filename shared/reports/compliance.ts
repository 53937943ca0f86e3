import { DateTime } from 'luxon'
import type { ComplianceRow } from '../schemas/report'

export interface ComplianceTask {
  localDate: string
  status: string
  lateMinutes: number | null
  group: string
}

/** ISO week label, e.g. "2026-W49", for weekly reports. */
export const isoWeek = (date: string) => DateTime.fromISO(date).toFormat("kkkk-'W'WW")

/**
 * Counts tasks per period and group: done on time, done late, missed, skipped, held, still
 * open. The on-time rate leaves out held tasks (a fasting window is not a failure) and tasks
 * still open (not yet judged).
 */
export function complianceRows(tasks: ComplianceTask[], period: 'day' | 'week'): ComplianceRow[] {
  const rows = new Map<string, ComplianceRow>()
  for (const t of tasks) {
    const p = period === 'day' ? t.localDate : isoWeek(t.localDate)
    const key = `${p}|${t.group}`
    const row = rows.get(key) ?? { period: p, group: t.group, total: 0, onTime: 0, late: 0, missed: 0, skipped: 0, held: 0, open: 0, onTimeRate: null }
    row.total++
    if (t.status === 'done') {
      if (t.lateMinutes && t.lateMinutes > 0) row.late++
      else row.onTime++
    } else if (t.status === 'missed') row.missed++
    else if (t.status === 'skipped') row.skipped++
    else if (t.status === 'held') row.held++
    else row.open++
    rows.set(key, row)
  }
  for (const row of rows.values()) {
    const judged = row.total - row.held - row.open
    row.onTimeRate = judged > 0 ? Math.round((row.onTime / judged) * 1000) / 1000 : null
  }
  return [...rows.values()].sort((a, b) => a.period.localeCompare(b.period) || a.group.localeCompare(b.group))
}
