import { describe, expect, it } from 'vitest'
import { describeSample } from '#shared/stats/sample-stats'
import reference from '../../fixtures/stats.json'

type CertifiedRow = (typeof reference.nist_univariate)[number]

/** The data of a NIST StRD row, from whichever form the fixture stores it in. */
function dataOf(row: CertifiedRow): number[] {
  if (row.data) return row.data
  if (row.data_digits) return [...row.data_digits].map(Number)
  if (row.data_parts) {
    const { first, pair, pairs } = row.data_parts
    return [first, ...Array.from({ length: pairs }, () => pair).flat()]
  }
  throw new Error(`No data stored for NIST StRD ${row.dataset}`)
}

const relativeError = (actual: number, expected: number) => Math.abs(actual - expected) / Math.abs(expected)

describe('describeSample reproduces the NIST StRD univariate certified values', () => {
  it.each(reference.nist_univariate.map((row) => [row.dataset, row] as const))(
    'NIST StRD %s: n, mean and sample SD match the certified values within the stated tolerance',
    (_dataset, row) => {
      const data = dataOf(row)
      expect(data).toHaveLength(row.n)
      const summary = describeSample(data)
      expect(summary.n).toBe(row.n)
      expect(relativeError(summary.mean, row.expected.mean)).toBeLessThanOrEqual(row.tolerance_rel.mean)
      expect(relativeError(summary.sd, row.expected.sample_sd)).toBeLessThanOrEqual(row.tolerance_rel.sample_sd)
    },
  )

  it('NIST StRD NumAcc4: SD 0.1 is recovered although each stored double is off by up to 9e-10', () => {
    // Large mean, tiny spread: the case one-pass sum-of-squares formulas get badly wrong.
    const row = reference.nist_univariate.find((candidate) => candidate.dataset === 'NumAcc4')
    if (!row) throw new Error('NumAcc4 missing from the fixture')
    expect(relativeError(describeSample(dataOf(row)).sd, row.expected.sample_sd)).toBeLessThanOrEqual(1e-12)
  })

  it('NIST StRD Mavro: cv is the certified SD over the certified mean, as a fraction', () => {
    const row = reference.nist_univariate.find((candidate) => candidate.dataset === 'Mavro')
    if (!row) throw new Error('Mavro missing from the fixture')
    const summary = describeSample(dataOf(row))
    expect(relativeError(summary.cv, row.expected.sample_sd / row.expected.mean)).toBeLessThan(1e-9)
  })

  it('NIST StRD Lew: min and max are the extremes of the data, in their own sign', () => {
    const row = reference.nist_univariate.find((candidate) => candidate.dataset === 'Lew')
    if (!row) throw new Error('Lew missing from the fixture')
    const data = dataOf(row)
    const summary = describeSample(data)
    expect(summary.min).toBe(data.reduce((low, value) => Math.min(low, value)))
    expect(summary.max).toBe(data.reduce((high, value) => Math.max(high, value)))
    expect(summary.min).toBeLessThan(0)
  })

  it('the order the fish were weighed in does not change the answer', () => {
    const row = reference.nist_univariate.find((candidate) => candidate.dataset === 'Lottery')
    if (!row) throw new Error('Lottery missing from the fixture')
    const forwards = describeSample(dataOf(row))
    const backwards = describeSample(dataOf(row).reverse())
    expect(backwards).toEqual(forwards)
  })
})

describe('describeSample at the edges', () => {
  it('a single weighed fish gives its weight as the mean and NaN for SD and CV, not an error', () => {
    const summary = describeSample([42.5])
    expect(summary).toMatchObject({ n: 1, mean: 42.5, min: 42.5, max: 42.5 })
    expect(summary.sd).toBeNaN()
    expect(summary.cv).toBeNaN()
  })

  it('identical values have SD 0 and CV 0', () => {
    const summary = describeSample([12.3, 12.3, 12.3])
    expect(summary.sd).toBe(0)
    expect(summary.cv).toBe(0)
  })

  it('a mean of exactly 0 leaves CV undefined (NaN) instead of dividing by zero', () => {
    expect(describeSample([-1, 1]).cv).toBeNaN()
  })

  it('values near the top of the double range give a finite SD instead of overflowing', () => {
    // Deviations are ±1e300, so SD = √(2 · 1e600 / 1) = √2 · 1e300.
    const summary = describeSample([1e300, 3e300])
    expect(summary.mean).toBe(2e300)
    expect(relativeError(summary.sd, Math.SQRT2 * 1e300)).toBeLessThan(1e-15)
  })

  it('an empty sample is refused with a message saying what is needed', () => {
    expect(() => describeSample([])).toThrow(/empty sample/)
  })

  it.each([Number.NaN, Infinity, -Infinity])('a value of %s is refused and its position named', (bad) => {
    expect(() => describeSample([10, 11, bad])).toThrow(/Value 3 is not a finite number/)
  })
})
