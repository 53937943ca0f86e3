import type { MovementKind } from '../schemas/stock'

/** The part of a movement the arithmetic needs. */
export interface LedgerEntry {
  id?: number
  batchId: number
  kind: MovementKind
  fromTankId: number | null
  toTankId: number | null
  /** Positive fish moved; for a correction the signed change to `toTankId`'s count. */
  count: number
  cause?: string | null
  correctsId?: number | null
}

export interface Change {
  batchId: number
  tankId: number
  change: number
}

const REMOVALS: MovementKind[] = ['mortality', 'cull', 'sampling', 'dispatch']

/** How one movement changes the count of its batch in each tank it touches. */
export function changesOf(m: LedgerEntry): Change[] {
  if (m.kind === 'arrival') return [{ batchId: m.batchId, tankId: m.toTankId!, change: m.count }]
  if (m.kind === 'transfer' || m.kind === 'grading') {
    return [
      { batchId: m.batchId, tankId: m.fromTankId!, change: -m.count },
      { batchId: m.batchId, tankId: m.toTankId!, change: m.count },
    ]
  }
  if (REMOVALS.includes(m.kind)) return [{ batchId: m.batchId, tankId: m.fromTankId!, change: -m.count }]
  return [{ batchId: m.batchId, tankId: m.toTankId!, change: m.count }]
}

export const balanceKey = (batchId: number, tankId: number) => `${batchId}:${tankId}`

/** Fish on hand per batch and tank after every movement in the list. */
export function balances(entries: LedgerEntry[]): Map<string, number> {
  const out = new Map<string, number>()
  for (const e of entries) for (const c of changesOf(e)) out.set(balanceKey(c.batchId, c.tankId), (out.get(balanceKey(c.batchId, c.tankId)) ?? 0) + c.change)
  return out
}

export interface Shortfall {
  batchId: number
  tankId: number
  onHand: number
  wanted: number
}

/** The first tank a movement would take below zero, or null when it fits the register. */
export function shortfallOf(current: Map<string, number>, m: LedgerEntry): Shortfall | null {
  for (const c of changesOf(m)) {
    const onHand = current.get(balanceKey(c.batchId, c.tankId)) ?? 0
    if (onHand + c.change < 0) return { batchId: c.batchId, tankId: c.tankId, onHand, wanted: -c.change }
  }
  return null
}

/** Applies a movement when it fits; returns the shortfall (and changes nothing) when it does not. */
export function applyMovement(current: Map<string, number>, m: LedgerEntry): Shortfall | null {
  const short = shortfallOf(current, m)
  if (short) return short
  for (const c of changesOf(m)) current.set(balanceKey(c.batchId, c.tankId), (current.get(balanceKey(c.batchId, c.tankId)) ?? 0) + c.change)
  return null
}

export const totalOnHand = (current: Map<string, number>, batchId?: number) =>
  [...current.entries()].filter(([k]) => batchId === undefined || k.startsWith(`${batchId}:`)).reduce((sum, [, n]) => sum + n, 0)

/** What a batch holds now: its count and the tanks that hold any of it (what the batch row keeps). */
export function batchHoldings(current: Map<string, number>, batchId: number): { count: number; tankIds: number[] } {
  const held = [...current.entries()].filter(([k, n]) => k.startsWith(`${batchId}:`) && n > 0)
  return { count: held.reduce((sum, [, n]) => sum + n, 0), tankIds: held.map(([k]) => Number(k.split(':')[1])) }
}

/** The batch holding most fish in a tank (whose fish a death on the round comes off), with its count. */
export function largestHolder(current: Map<string, number>, tankId: number): { batchId: number; onHand: number } | null {
  const held = [...current.entries()].filter(([k, n]) => k.endsWith(`:${tankId}`) && n > 0).sort((a, b) => b[1] - a[1])
  return held.length ? { batchId: Number(held[0][0].split(':')[0]), onHand: held[0][1] } : null
}
