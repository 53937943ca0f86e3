import { UNKNOWN_CAUSE } from '../schemas/stock'
import { changesOf, type LedgerEntry } from './ledger'

export interface DatedEntry extends LedgerEntry {
  /** ISO instant; entries are compared as strings, so all must be in UTC. */
  occurredAt: string
}

/** What a batch, or a batch in one tank, began and ended a period with, and what happened between. */
interface PeriodCounts {
  batchId: number
  opening: number
  arrived: number
  died: number
  diedByCause: Record<string, number>
  culled: number
  used: number
  dispatched: number
  /** Net count corrections, other than corrections of a recorded death. */
  corrected: number
  closing: number
}

export interface BatchPeriodFigures extends PeriodCounts {
  /** Fish moved between tanks inside the batch (transfers and gradings); they change no total. */
  moved: number
}

const empty = (batchId: number): BatchPeriodFigures => ({
  batchId,
  opening: 0,
  arrived: 0,
  moved: 0,
  died: 0,
  diedByCause: {},
  culled: 0,
  used: 0,
  dispatched: 0,
  corrected: 0,
  closing: 0,
})

/**
 * A batch's numbers for [from, to): what it held at the start, what came, moved, died (by
 * cause), was culled, used or sent out, and what it held at the end. A correction that points
 * at a recorded death changes the deaths (an amended mortality count), not the corrections.
 */
export function periodFigures(entries: DatedEntry[], from: string, to: string): BatchPeriodFigures[] {
  const byId = new Map(entries.filter((e) => e.id !== undefined).map((e) => [e.id!, e]))
  const out = new Map<number, BatchPeriodFigures>()
  const row = (batchId: number) => out.get(batchId) ?? out.set(batchId, empty(batchId)).get(batchId)!
  for (const e of entries) {
    if (e.occurredAt >= to) continue
    const r = row(e.batchId)
    const net = e.kind === 'arrival' ? e.count : e.kind === 'correction' ? e.count : e.kind === 'transfer' || e.kind === 'grading' ? 0 : -e.count
    if (e.occurredAt < from) {
      r.opening += net
      continue
    }
    const corrected = e.kind === 'correction' && e.correctsId ? byId.get(e.correctsId) : undefined
    if (e.kind === 'arrival') r.arrived += e.count
    else if (e.kind === 'transfer' || e.kind === 'grading') r.moved += e.count
    else if (e.kind === 'mortality') addDeath(r, e.cause, e.count)
    else if (e.kind === 'cull') r.culled += e.count
    else if (e.kind === 'sampling') r.used += e.count
    else if (e.kind === 'dispatch') r.dispatched += e.count
    else if (corrected?.kind === 'mortality') addDeath(r, corrected.cause, -e.count)
    else r.corrected += e.count
  }
  for (const r of out.values()) r.closing = r.opening + r.arrived - r.died - r.culled - r.used - r.dispatched + r.corrected
  return [...out.values()].sort((a, b) => a.batchId - b.batchId)
}

function addDeath(r: PeriodCounts, cause: string | null | undefined, n: number) {
  const key = cause || UNKNOWN_CAUSE
  r.died += n
  r.diedByCause[key] = (r.diedByCause[key] ?? 0) + n
  if (r.diedByCause[key] === 0) delete r.diedByCause[key]
}

export interface TankPeriodFigures extends PeriodCounts {
  tankId: number
  movedIn: number
  movedOut: number
}

/**
 * The same period split per batch and tank: a transfer is out of one tank and into another, so
 * over a batch's tanks the moves in and out are equal. Opening counts come from the register's
 * own arithmetic (changesOf), so a closing count that matches it proves every row was counted.
 */
export function tankPeriodFigures(entries: DatedEntry[], from: string, to: string): TankPeriodFigures[] {
  const byId = new Map(entries.filter((e) => e.id !== undefined).map((e) => [e.id!, e]))
  const out = new Map<string, TankPeriodFigures>()
  const row = (batchId: number, tankId: number) => {
    const key = `${batchId}:${tankId}`
    if (!out.has(key))
      out.set(key, {
        batchId,
        tankId,
        opening: 0,
        arrived: 0,
        movedIn: 0,
        movedOut: 0,
        died: 0,
        diedByCause: {},
        culled: 0,
        used: 0,
        dispatched: 0,
        corrected: 0,
        closing: 0,
      })
    return out.get(key)!
  }
  for (const e of entries) {
    if (e.occurredAt >= to) continue
    if (e.occurredAt < from) {
      for (const c of changesOf(e)) row(c.batchId, c.tankId).opening += c.change
      continue
    }
    const corrected = e.kind === 'correction' && e.correctsId ? byId.get(e.correctsId) : undefined
    if (e.kind === 'arrival') row(e.batchId, e.toTankId!).arrived += e.count
    else if (e.kind === 'transfer' || e.kind === 'grading') {
      row(e.batchId, e.fromTankId!).movedOut += e.count
      row(e.batchId, e.toTankId!).movedIn += e.count
    } else if (e.kind === 'mortality') addDeath(row(e.batchId, e.fromTankId!), e.cause, e.count)
    else if (e.kind === 'cull') row(e.batchId, e.fromTankId!).culled += e.count
    else if (e.kind === 'sampling') row(e.batchId, e.fromTankId!).used += e.count
    else if (e.kind === 'dispatch') row(e.batchId, e.fromTankId!).dispatched += e.count
    else if (corrected?.kind === 'mortality') addDeath(row(e.batchId, e.toTankId!), corrected.cause, -e.count)
    else row(e.batchId, e.toTankId!).corrected += e.count
  }
  for (const r of out.values()) r.closing = r.opening + r.arrived + r.movedIn - r.movedOut - r.died - r.culled - r.used - r.dispatched + r.corrected
  return [...out.values()].sort((a, b) => a.batchId - b.batchId || a.tankId - b.tankId)
}
