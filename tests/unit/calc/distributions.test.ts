import { describe, expect, it } from 'vitest'
import { normalCdf, normalQuantile, studentTCdf, studentTQuantile, twoSidedProbability } from '#shared/stats/distributions'
import { lnBeta, lnGamma, regularizedIncompleteBeta, regularizedLowerGamma } from '#shared/stats/special-functions'

const relativeError = (actual: number, expected: number) => Math.abs(actual - expected) / Math.abs(expected)

describe('ln Γ agrees with exact identities', () => {
  it('Γ(n) = (n − 1)! for n = 1 … 25', () => {
    let logFactorial = 0
    for (let n = 1; n <= 25; n++) {
      if (n > 1) logFactorial += Math.log(n - 1)
      expect(Math.abs(lnGamma(n) - logFactorial)).toBeLessThan(1e-13 * Math.max(1, logFactorial))
    }
  })

  it('Γ(½) = √π, which exercises the reflection branch below ½ through Γ(¼)Γ(¾) = π√2', () => {
    expect(lnGamma(0.5)).toBeCloseTo(0.5 * Math.log(Math.PI), 14)
    expect(lnGamma(0.25) + lnGamma(0.75)).toBeCloseTo(Math.log(Math.PI * Math.SQRT2), 14)
  })

  it('Γ(x + 1) = x Γ(x) holds for fractional arguments small and large', () => {
    for (const x of [0.3, 2.7, 41.25, 150.5]) {
      expect(lnGamma(x + 1) - lnGamma(x)).toBeCloseTo(Math.log(x), 12)
    }
  })

  it('rejects zero and negative arguments rather than returning a wrong number', () => {
    expect(() => lnGamma(0)).toThrow(RangeError)
    expect(() => lnGamma(-1.5)).toThrow(RangeError)
  })
})

describe('ln B stays accurate when one argument is huge', () => {
  it('B(a, b + 1) = B(a, b) · b / (a + b) holds at b = 10⁶, where ln Γ values would cancel', () => {
    const b = 1e6
    expect(lnBeta(0.5, b + 1) - lnBeta(0.5, b)).toBeCloseTo(Math.log(b / (b + 0.5)), 13)
  })

  it('the Stirling branch (b ≥ 100) agrees with the plain ln Γ sum and with the recurrence across 100', () => {
    const plainSum = lnGamma(0.5) + lnGamma(100.5) - lnGamma(101)
    expect(lnBeta(0.5, 100.5)).toBeCloseTo(plainSum, 12)
    expect(lnBeta(0.5, 100.5) - lnBeta(0.5, 99.5)).toBeCloseTo(Math.log(99.5 / 100), 12)
  })
})

describe('incomplete beta and gamma agree with their closed forms', () => {
  it('I_x(1, 1) = x, I_x(a, 1) = x^a and I_x(1, b) = 1 − (1 − x)^b', () => {
    for (const x of [0.01, 0.3, 0.5, 0.77, 0.999]) {
      expect(regularizedIncompleteBeta(x, 1, 1)).toBeCloseTo(x, 14)
      expect(regularizedIncompleteBeta(x, 3.5, 1)).toBeCloseTo(x ** 3.5, 14)
      expect(regularizedIncompleteBeta(x, 1, 7)).toBeCloseTo(1 - (1 - x) ** 7, 14)
    }
  })

  it('I_x(a, b) + I_{1−x}(b, a) = 1 on both sides of the continued-fraction switch', () => {
    for (const [x, a, b] of [
      [0.2, 2.5, 9],
      [0.8, 2.5, 9],
      [0.6, 40, 0.5],
    ]) {
      expect(regularizedIncompleteBeta(x, a, b) + regularizedIncompleteBeta(1 - x, b, a)).toBeCloseTo(1, 14)
    }
  })

  it('P(1, x) = 1 − e^−x and P(2, x) = 1 − e^−x (1 + x) in both the series and fraction regions', () => {
    for (const x of [0.05, 1.5, 3, 12, 40]) {
      expect(regularizedLowerGamma(1, x)).toBeCloseTo(1 - Math.exp(-x), 14)
      expect(regularizedLowerGamma(2, x)).toBeCloseTo(1 - Math.exp(-x) * (1 + x), 14)
    }
  })
})

describe('normal quantiles', () => {
  it('z(0.975) = 1.959964, the value the Krebs/Zar sample-size rows were computed with', () => {
    expect(normalQuantile(0.975)).toBeCloseTo(1.959964, 6)
  })

  it('z(0.95) = 1.644854 and z(0.995) = 2.575829 (published normal table, from memory)', () => {
    expect(normalQuantile(0.95)).toBeCloseTo(1.644854, 6)
    expect(normalQuantile(0.995)).toBeCloseTo(2.575829, 6)
  })

  it('is the inverse of the CDF and symmetric about zero', () => {
    for (const p of [0.001, 0.2, 0.5, 0.6, 0.999]) {
      expect(normalCdf(normalQuantile(p))).toBeCloseTo(p, 13)
      expect(normalQuantile(1 - p)).toBeCloseTo(-normalQuantile(p), 12)
    }
  })
})

describe("Student's t quantiles", () => {
  it('match the exact forms at 1 df, t = tan(π(p − ½)), and 2 df, t = (2p − 1)/√(2p(1 − p))', () => {
    for (const p of [0.6, 0.9, 0.975, 0.995]) {
      expect(relativeError(studentTQuantile(p, 1), Math.tan(Math.PI * (p - 0.5)))).toBeLessThan(1e-12)
      expect(relativeError(studentTQuantile(p, 2), (2 * p - 1) / Math.sqrt(2 * p * (1 - p)))).toBeLessThan(1e-12)
    }
  })

  // Published two-sided 95 % t table (3 decimals), from memory.
  const twoSided95: [number, number][] = [
    [1, 12.706],
    [2, 4.303],
    [3, 3.182],
    [4, 2.776],
    [5, 2.571],
    [6, 2.447],
    [7, 2.365],
    [8, 2.306],
    [9, 2.262],
    [10, 2.228],
    [15, 2.131],
    [20, 2.086],
    [30, 2.042],
    [60, 2.0],
    [120, 1.98],
  ]
  it.each(twoSided95)('t(0.975, %i df) = %f as printed in a t table (from memory)', (df, printed) => {
    expect(studentTQuantile(twoSidedProbability(0.95), df)).toBeCloseTo(printed, 3)
  })

  it('one-sided and 99 % columns of the t table also match (from memory)', () => {
    expect(studentTQuantile(0.95, 10)).toBeCloseTo(1.812, 3)
    expect(studentTQuantile(0.95, 30)).toBeCloseTo(1.697, 3)
    expect(studentTQuantile(0.995, 10)).toBeCloseTo(3.169, 3)
    expect(studentTQuantile(0.995, 30)).toBeCloseTo(2.75, 3)
  })

  it('approaches the normal quantile as the degrees of freedom grow', () => {
    const z = normalQuantile(0.975)
    expect(studentTQuantile(0.975, 1e6) - z).toBeGreaterThan(0)
    expect(studentTQuantile(0.975, 1e6) - z).toBeLessThan(1e-5)
  })

  it('inverts the t CDF, which is symmetric, for fractional degrees of freedom too', () => {
    for (const df of [0.7, 3.5, 250]) {
      const t = studentTQuantile(0.9, df)
      expect(studentTCdf(t, df)).toBeCloseTo(0.9, 13)
      expect(studentTCdf(-t, df)).toBeCloseTo(0.1, 13)
    }
  })

  it('refuses probabilities of 0 or 1, non-positive df and confidences outside (0, 1)', () => {
    expect(() => studentTQuantile(1, 5)).toThrow(RangeError)
    expect(() => studentTQuantile(0, 5)).toThrow(RangeError)
    expect(() => studentTQuantile(0.9, 0)).toThrow(RangeError)
    expect(() => twoSidedProbability(95)).toThrow(/fraction/)
  })
})
