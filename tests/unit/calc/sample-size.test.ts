import { describe, expect, it } from 'vitest'
import { normalQuantile, studentTQuantile } from '#shared/stats/distributions'
import { nextTBasedSampleSize, normalApproxSampleSize, roundUpSampleSize, sampleSizeForMean } from '#shared/stats/sample-stats'
import reference from '../../fixtures/stats.json'

const relativeRows = reference.sample_size_relative.map((row) => ({
  cv: row.inputs.CV_percent / 100,
  relativeError: row.inputs.E_percent / 100,
  label: `CV ${row.inputs.CV_percent} %, E ±${row.inputs.E_percent} %`,
  ...row.expected,
  tolerance: row.tolerance_abs.n_z_exact,
}))

describe('sample size to estimate a mean within ±E % (Krebs 1998 / Zar 2007 formula rows)', () => {
  it.each(relativeRows)('$label: the normal-approximation n is (z·CV/E)² = $n_z_exact', (row) => {
    const exact = normalApproxSampleSize(row.cv, row.relativeError, normalQuantile(0.975))
    expect(Math.abs(exact - row.n_z_exact)).toBeLessThanOrEqual(row.tolerance)
    expect(roundUpSampleSize(exact)).toBe(row.n_z_ceiling)
  })

  it.each(relativeRows)('$label: iterating with Student t settles on $n_t_iterated fish', (row) => {
    expect(sampleSizeForMean(row.cv, row.relativeError)).toBe(row.n_t_iterated)
  })

  it('CV 47 %, E ±25 %: the t update alternates 16 ↔ 17 and the larger, 17, is returned', () => {
    const row = relativeRows.find((candidate) => candidate.label === 'CV 47 %, E ±25 %')
    if (!row) throw new Error('row missing from the fixture')
    expect(nextTBasedSampleSize(16, row.cv, row.relativeError)).toBe(17)
    expect(nextTBasedSampleSize(17, row.cv, row.relativeError)).toBe(16)
    expect(sampleSizeForMean(row.cv, row.relativeError)).toBe(row.n_t_iterated)
  })
})

describe('absolute-precision rows n = (z·s/d)² (same formula source)', () => {
  it('z 1.96, s 5, d 0.2 gives exactly 2401, and rounding up does not add a spurious 2402nd', () => {
    const row = reference.sample_size_absolute.find((candidate) => candidate.inputs.sd === 5)
    if (!row) throw new Error('row missing from the fixture')
    const exact = normalApproxSampleSize(row.inputs.sd, row.inputs.d, row.inputs.z)
    expect(exact).toBeCloseTo(Number(row.expected), 9)
    expect(roundUpSampleSize(exact)).toBe(Number(row.expected))
  })

  it('z 1.96, s 12.4, d 3 gives 65.6316, rounded up to 66', () => {
    const row = reference.sample_size_absolute.find((candidate) => candidate.inputs.sd === 12.4)
    if (!row || typeof row.expected === 'number') throw new Error('row missing from the fixture')
    const exact = normalApproxSampleSize(row.inputs.sd, row.inputs.d, row.inputs.z)
    expect(exact).toBeCloseTo(row.expected.n_exact, 4)
    expect(roundUpSampleSize(exact)).toBe(row.expected.n_ceiling)
  })
})

describe('what the returned sample size promises', () => {
  const grid = [0.05, 0.12, 0.2, 0.35, 0.6, 1.1].flatMap((cv) => [0.03, 0.05, 0.1, 0.2, 0.3].map((relativeError) => ({ cv, relativeError })))

  it('always meets the precision it was asked for: n ≥ (t(0.975, n − 1)·CV/E)²', () => {
    for (const { cv, relativeError } of grid) {
      const n = sampleSizeForMean(cv, relativeError)
      const t = studentTQuantile(0.975, n - 1)
      expect(n, `CV ${cv}, E ${relativeError}`).toBeGreaterThanOrEqual(((t * cv) / relativeError) ** 2)
    }
  })

  it('is never below the normal-approximation answer, because t exceeds z at any finite df', () => {
    for (const { cv, relativeError } of grid) {
      const normal = roundUpSampleSize(normalApproxSampleSize(cv, relativeError, normalQuantile(0.975)))
      expect(sampleSizeForMean(cv, relativeError)).toBeGreaterThanOrEqual(normal)
    }
  })

  it('grows with the confidence asked for: 90 % < 95 % < 99 %', () => {
    const at = (confidence: number) => sampleSizeForMean(0.3, 0.1, confidence)
    expect(at(0.9)).toBeLessThan(at(0.95))
    expect(at(0.95)).toBeLessThan(at(0.99))
  })

  it('never asks for fewer than 2 fish, the least that shows any spread', () => {
    expect(sampleSizeForMean(0.01, 0.5)).toBe(2)
  })
})

describe('sample size refuses inputs that have no meaning', () => {
  it.each([
    ['a CV of 0', 0, 0.1],
    ['a negative CV', -0.2, 0.1],
    ['an allowed error of 0', 0.3, 0],
    ['a negative allowed error', 0.3, -0.1],
    ['a CV that is not a number', Number.NaN, 0.1],
  ])('%s', (_label, cv, relativeError) => {
    expect(() => sampleSizeForMean(cv, relativeError)).toThrow(RangeError)
  })

  it('a confidence written as a percentage (95) is refused with a hint to use a fraction', () => {
    expect(() => sampleSizeForMean(0.3, 0.1, 95)).toThrow(/fraction/)
  })
})
