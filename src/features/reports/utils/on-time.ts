import type { ComplianceRow } from '#shared/schemas/report'

export interface OnTimePoint {
  period: string
  /** Percent done on time of the tasks that were due and not held; null when none were. */
  rate: number | null
  judged: number
}

const judgedOf = (r: ComplianceRow) => r.total - r.held - r.open

/** All groups of a period together, the way the server counts a single row. */
export function onTimeTrend(rows: ComplianceRow[]): OnTimePoint[] {
  const byPeriod = new Map<string, { onTime: number; judged: number }>()
  for (const r of rows) {
    const p = byPeriod.get(r.period) ?? { onTime: 0, judged: 0 }
    p.onTime += r.onTime
    p.judged += judgedOf(r)
    byPeriod.set(r.period, p)
  }
  return [...byPeriod]
    .sort(([a], [b]) => a.localeCompare(b))
    .map(([period, p]) => ({ period, judged: p.judged, rate: p.judged ? Math.round((p.onTime / p.judged) * 1000) / 10 : null }))
}

export function overallOnTime(rows: ComplianceRow[]) {
  const judged = rows.reduce((n, r) => n + judgedOf(r), 0)
  const onTime = rows.reduce((n, r) => n + r.onTime, 0)
  return { judged, rate: judged ? Math.round((onTime / judged) * 1000) / 10 : null }
}

export const percent = (rate: number | null) => (rate === null ? '—' : `${Math.round(rate * 1000) / 10}%`)
