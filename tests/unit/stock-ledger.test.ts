import fc from 'fast-check'
import { describe, expect, test } from 'vitest'
import { MOVEMENT_KINDS } from '#shared/schemas/stock'
import { biomassKg, stockingDensityKgM3 } from '#shared/stock/density'
import { applyMovement, balances, totalOnHand, type LedgerEntry } from '#shared/stock/ledger'
import { periodFigures, tankPeriodFigures, type DatedEntry } from '#shared/stock/period-report'
import reference from '../fixtures/stocking_transport.json'

const TANKS = [1, 2, 3]
const movement = fc.record({
  kind: fc.constantFrom(...MOVEMENT_KINDS),
  from: fc.constantFrom(...TANKS),
  to: fc.constantFrom(...TANKS),
  count: fc.integer({ min: 1, max: 60 }),
  sign: fc.boolean(),
})

function toEntry(m: { kind: LedgerEntry['kind']; from: number; to: number; count: number; sign: boolean }, i: number): DatedEntry {
  const moves = m.kind === 'transfer' || m.kind === 'grading'
  return {
    id: i + 1,
    batchId: 7,
    kind: m.kind,
    count: m.kind === 'correction' && m.sign ? -m.count : m.count,
    fromTankId: m.kind === 'arrival' || m.kind === 'correction' ? null : m.from,
    toTankId: m.kind === 'arrival' || m.kind === 'correction' ? m.to : moves ? (m.to === m.from ? (m.from % 3) + 1 : m.to) : null,
    cause: m.kind === 'mortality' ? 'unknown' : null,
    occurredAt: new Date(Date.UTC(2026, 0, 1) + i * 3_600_000).toISOString(),
  }
}

describe('the stock register arithmetic', () => {
  test('whatever the sequence, no tank goes below zero and on hand is always what came in less what went out', () => {
    fc.assert(
      fc.property(fc.array(movement, { maxLength: 40 }), (ms) => {
        const current = new Map<string, number>()
        let inMinusOut = 0
        const accepted: DatedEntry[] = []
        ms.map(toEntry).forEach((e) => {
          if (applyMovement(current, e) === null) {
            accepted.push(e)
            inMinusOut += e.kind === 'arrival' || e.kind === 'correction' ? e.count : e.kind === 'transfer' || e.kind === 'grading' ? 0 : -e.count
          }
          expect([...current.values()].every((n) => n >= 0)).toBe(true)
          expect(totalOnHand(current)).toBe(inMinusOut)
        })
        expect(balances(accepted)).toEqual(current)
        const [year] = periodFigures(accepted, '2026-01-01T00:00:00.000Z', '2027-01-01T00:00:00.000Z')
        if (year) expect(year.closing).toBe(inMinusOut)
        // Split per tank, from a cut mid-sequence: each tank closes on what the register holds, and moves between tanks cancel.
        const perTank = tankPeriodFigures(accepted, new Date(Date.UTC(2026, 0, 1) + 20 * 3_600_000).toISOString(), '2027-01-01T00:00:00.000Z')
        for (const t of perTank) expect(t.closing).toBe(current.get(`${t.batchId}:${t.tankId}`) ?? 0)
        expect(perTank.reduce((n, t) => n + t.movedIn, 0)).toBe(perTank.reduce((n, t) => n + t.movedOut, 0))
      }),
      { numRuns: 1000 },
    )
  })

  test('a refused movement changes nothing', () => {
    const current = new Map<string, number>()
    applyMovement(current, { batchId: 1, kind: 'arrival', fromTankId: null, toTankId: 1, count: 5 })
    const short = applyMovement(current, { batchId: 1, kind: 'mortality', fromTankId: 1, toTankId: null, count: 6 })
    expect(short).toEqual({ batchId: 1, tankId: 1, onHand: 5, wanted: 6 })
    expect(current.get('1:1')).toBe(5)
  })

  test('a period report splits what happened before the period into the opening count, and a corrected death changes the deaths', () => {
    const e = (id: number, day: string, rest: Omit<DatedEntry, 'id' | 'occurredAt' | 'batchId'>): DatedEntry => ({
      id,
      batchId: 1,
      occurredAt: `${day}T08:00:00.000Z`,
      ...rest,
    })
    const entries = [
      e(1, '2026-01-05', { kind: 'arrival', fromTankId: null, toTankId: 1, count: 500 }),
      e(2, '2026-02-01', { kind: 'mortality', fromTankId: 1, toTankId: null, count: 3, cause: 'Water quality' }),
      e(3, '2026-02-02', { kind: 'correction', fromTankId: null, toTankId: 1, count: -2, correctsId: 2 }),
      e(4, '2026-02-03', { kind: 'transfer', fromTankId: 1, toTankId: 2, count: 200 }),
      e(5, '2026-02-04', { kind: 'sampling', fromTankId: 2, toTankId: null, count: 10 }),
      e(6, '2026-02-05', { kind: 'correction', fromTankId: null, toTankId: 2, count: 4 }),
      e(7, '2026-03-01', { kind: 'dispatch', fromTankId: 2, toTankId: null, count: 50 }),
    ]
    expect(periodFigures(entries, '2026-02-01T00:00:00.000Z', '2026-03-01T00:00:00.000Z')).toEqual([
      {
        batchId: 1,
        opening: 500,
        arrived: 0,
        moved: 200,
        died: 5,
        diedByCause: { 'Water quality': 5 },
        culled: 0,
        used: 10,
        dispatched: 0,
        corrected: 4,
        closing: 489,
      },
    ])
  })
})

describe('stocking density', () => {
  test('4 lb of catfish per US gallon (Piper et al. 1982, p.362) is 479.3 kg/m³ by hand: 4 × 0.45359237 kg / 3.785411784 L × 1000', () => {
    const row = reference.rows.find((r) => r.source.startsWith('Piper'))!
    const lbPerGal = Number((row.expected as Record<string, unknown>).lb_per_gal_16in_at_65F)
    // A 1,000-gallon hauling tank loaded at that rate: 4,000 lb of fish of 1 lb (453.59237 g) each.
    const volumeL = 1000 * 3.785411784
    const fish = 1000 * lbPerGal
    const density = stockingDensityKgM3(biomassKg(fish, 453.59237), volumeL)!
    const byHand = ((lbPerGal * 0.45359237) / 3.785411784) * 1000
    expect(byHand).toBeCloseTo(479.3, 1)
    expect(density).toBeCloseTo(byHand, 6)
  })

  test('0.7–1.0 kg per litre of catfish on delivery (Wynne 2007) is 700–1,000 kg/m³', () => {
    // 350 fish of 2 kg in a 1,000 L tank: 700 kg in 1 m³; 500 fish of 2 kg: 1,000 kg.
    expect(stockingDensityKgM3(biomassKg(350, 2000), 1000)).toBeCloseTo(700, 6)
    expect(stockingDensityKgM3(biomassKg(500, 2000), 1000)).toBeCloseTo(1000, 6)
  })

  test('the same handbook’s cooler-water load, 5.0 lb per gallon at 55 °F (Piper et al. 1982, p.362 rule: +25 % per 10 °F cooler), is 599.1 kg/m³', () => {
    const row = reference.rows.find((r) => r.quantity === 'catfish load at 55 F') as { expected_lb_per_gal: number; source: string }
    expect(row.source).toMatch(/^Piper et al\. \(1982\)/)
    // 600 fish of 2.5 lb in a 300-gallon tank: 1,500 lb in 300 gal is 5.0 lb/gal.
    const density = stockingDensityKgM3(biomassKg(600, 2.5 * 453.59237), 300 * 3.785411784)!
    const byHand = ((row.expected_lb_per_gal * 0.45359237) / 3.785411784) * 1000
    expect(byHand).toBeCloseTo(599.1, 1)
    expect(density).toBeCloseTo(byHand, 6)
  })

  test('an empty or volume-less tank has no density', () => {
    expect(stockingDensityKgM3(10, 0)).toBeNull()
  })
})
