import { DateTime } from 'luxon'
import type { IncidentReportRow, StockReportRow } from '#shared/schemas/animal-report'
import { deadlineStatuses } from '#shared/incidents/deadlines'
import { balances, balanceKey } from '#shared/stock/ledger'
import { tankPeriodFigures, type DatedEntry, type TankPeriodFigures } from '#shared/stock/period-report'
import { batches, tanks } from '../facility/catalogues'
import { getFacility } from '../facility/facility.service'
import { listIncidents } from '../incidents/incidents.service'
import { allMovementRows } from '../stock/stock.service'
import { toEntry } from '../stock/stock-lock'

/** Facility days from–to as UTC instants [start of `from`, start of the day after `to`). */
export async function facilityPeriod(from: string, to: string) {
  const zone = (await getFacility()).timeZone
  const start = DateTime.fromISO(from, { zone }).startOf('day').toUTC().toISO()!
  const end = DateTime.fromISO(to, { zone }).plus({ days: 1 }).startOf('day').toUTC().toISO()!
  return { start, end }
}

const causes = (byCause: Record<string, number>) =>
  Object.entries(byCause)
    .sort((a, b) => b[1] - a[1] || a[0].localeCompare(b[0]))
    .map(([cause, n]) => `${cause} ${n}`)
    .join('; ')

const NUMBERS = ['opening', 'arrived', 'movedIn', 'movedOut', 'died', 'culled', 'used', 'dispatched', 'corrected', 'closing'] as const

/**
 * Per batch, and per tank within it, what the period began with, what came, moved, died (by
 * cause), was culled, used and sent out, and what it ended with. Each line is checked against
 * the register: its closing count must be what the register holds at the period's end, and a
 * batch's moves in and out of its tanks must cancel.
 */
export async function stockReport(from: string, to: string, batchId?: number): Promise<StockReportRow[]> {
  const { start, end } = await facilityPeriod(from, to)
  const rows = await allMovementRows(batchId ? [batchId] : undefined)
  const entries: DatedEntry[] = rows.map((m) => ({ ...toEntry(m), occurredAt: m.occurredAt.toISOString() }))
  const held = balances(entries.filter((e) => e.occurredAt < end))
  const [batchRows, tankRows] = await Promise.all([batches.list(), tanks.list()])
  const batchOf = new Map(batchRows.map((b) => [b.id, b]))
  const tankCode = new Map(tankRows.map((t) => [t.id, t.code]))
  const figures = tankPeriodFigures(entries, start, end).filter((f) => NUMBERS.some((k) => f[k] !== 0))
  const out: StockReportRow[] = []
  for (const id of [...new Set(figures.map((f) => f.batchId))]) {
    const batch = batchOf.get(id)
    const lines = figures.filter((f) => f.batchId === id)
    const line = (f: Omit<TankPeriodFigures, 'batchId' | 'tankId'>, tankId: number | null, balanced: boolean): StockReportRow =>
      ({
        batchId: id,
        batchCode: batch?.code ?? `#${id}`,
        species: batch?.species ?? '',
        tankId,
        tank: tankId === null ? 'All tanks' : (tankCode.get(tankId) ?? `tank ${tankId}`),
        ...Object.fromEntries(NUMBERS.map((k) => [k, f[k]])),
        diedByCause: causes(f.diedByCause),
        balanced,
      }) as StockReportRow
    const tankLines = lines.map((f) => line(f, f.tankId, f.closing === (held.get(balanceKey(id, f.tankId)) ?? 0)))
    const total = { ...Object.fromEntries(NUMBERS.map((k) => [k, lines.reduce((s, f) => s + f[k], 0)])), diedByCause: sumCauses(lines) } as Omit<
      TankPeriodFigures,
      'batchId' | 'tankId'
    >
    const onRegister = [...held.entries()].filter(([k]) => k.startsWith(`${id}:`)).reduce((s, [, n]) => s + n, 0)
    const arithmetic = total.opening + total.arrived - total.died - total.culled - total.used - total.dispatched + total.corrected
    const balanced = total.movedIn === total.movedOut && total.closing === arithmetic && total.closing === onRegister && tankLines.every((t) => t.balanced)
    out.push(line(total, null, balanced), ...tankLines)
  }
  return out
}

function sumCauses(lines: TankPeriodFigures[]) {
  const sum: Record<string, number> = {}
  for (const l of lines) for (const [cause, n] of Object.entries(l.diedByCause)) sum[cause] = (sum[cause] ?? 0) + n
  for (const [cause, n] of Object.entries(sum)) if (n === 0) delete sum[cause]
  return sum
}

/** The incidents noticed in the period (dismissed proposals left out) with each deadline met or missed. */
export async function incidentReport(from: string, to: string, now = new Date()): Promise<IncidentReportRow[]> {
  const { start, end } = await facilityPeriod(from, to)
  const codes = new Map((await tanks.list()).map((t) => [t.id, t.code]))
  const found = (await listIncidents()).filter((i) => i.status !== 'dismissed' && i.noticedAt >= start && i.noticedAt < end).reverse()
  return found.map((i) => {
    const [welfare, committee, report] = deadlineStatuses(i, now.toISOString())
    return {
      id: i.id,
      title: i.title,
      status: i.status,
      source: i.source,
      noticedAt: i.noticedAt,
      tanks: i.tankIds.map((t) => codes.get(t) ?? `tank ${t}`).join(', '),
      affected: i.affected,
      dead: i.dead,
      welfareDueAt: welfare.dueAt,
      welfareDoneAt: welfare.doneAt ?? '',
      welfare: welfare.state,
      committeeDueAt: committee.dueAt,
      committeeDoneAt: committee.doneAt ?? '',
      committee: committee.state,
      reportDueAt: report.dueAt,
      reportDoneAt: report.doneAt ?? '',
      report: report.state,
    }
  })
}
