/**
 * Summary statistics of a sample (e.g. weights or lengths of fish in a sub-sample) and the sample size
 * needed to estimate a mean to a chosen relative precision.
 */
import { normalQuantile, studentTQuantile, twoSidedProbability } from './distributions'
import { exactMoments } from './exact-decimal'

export type SampleDescription = {
  n: number
  mean: number
  /** Sample standard deviation (n − 1 divisor). NaN when n = 1: one value says nothing about spread. */
  sd: number
  /** sd / mean as a fraction (0.3 = 30 %). NaN when n = 1 or the mean is 0. Meant for positive data. */
  cv: number
  min: number
  max: number
}

/**
 * Describes a sample. Throws on an empty sample or on any value that is not a finite number.
 * A single value is accepted (its mean is useful on its own); sd and cv are then NaN rather than an
 * error, so callers can show the mean and mark the spread as "needs at least 2 values".
 *
 * Accuracy: sums are exact on the values as typed (see exact-decimal.ts), which reproduces the NIST
 * StRD certified mean and SD, including the NumAcc data sets built to break one-pass formulas.
 */
export function describeSample(values: readonly number[]): SampleDescription {
  if (values.length === 0) throw new RangeError('Cannot describe an empty sample: enter at least one value')
  let min = Infinity
  let max = -Infinity
  values.forEach((value, index) => {
    if (typeof value !== 'number' || !Number.isFinite(value)) {
      throw new RangeError(`Value ${index + 1} is not a finite number (${String(value)})`)
    }
    if (value < min) min = value
    if (value > max) max = value
  })
  const { count, mean, sd } = exactMoments(values)
  const cv = count < 2 || mean === 0 ? Number.NaN : sd / mean
  return { n: count, mean, sd, cv, min, max }
}

function requirePositiveFraction(value: number, name: string): void {
  if (!Number.isFinite(value) || value <= 0) {
    throw new RangeError(`${name} must be a positive fraction (e.g. 0.1 for 10 %), got ${value}`)
  }
}

/**
 * Rounds a computed sample size up to whole units, ignoring floating-point noise just above a whole
 * number: (1.96 × 5 / 0.2)² is exactly 2401 and a stray 2401.0000000000005 must not become 2402.
 */
export function roundUpSampleSize(value: number): number {
  if (!Number.isFinite(value) || value < 0) throw new RangeError(`Sample size must be 0 or more, got ${value}`)
  return Math.ceil(value - value * 1e-12)
}

/** The smallest n a t-interval may use: n − 1 = 1 degree of freedom is the least that estimates spread. */
const MINIMUM_SAMPLE_SIZE = 2

/**
 * Large-sample (normal) sample size, not rounded: n = (z · s / d)². With s = CV and d = E as fractions
 * of the mean this is the relative form (z · CV / E)². Krebs (1998) Ecological Methodology ch. 5;
 * Zar (2007) Biostatistical Analysis ch. 8.
 */
export function normalApproxSampleSize(spread: number, allowedError: number, z: number): number {
  requirePositiveFraction(spread, 'Spread (SD or CV)')
  requirePositiveFraction(allowedError, 'Allowed error')
  if (!(z > 0) || !Number.isFinite(z)) throw new RangeError(`z must be positive, got ${z}`)
  return ((z * spread) / allowedError) ** 2
}

/** One t-based update: n′ = ⌈(t(1 − α/2, n − 1) · CV / E)²⌉, never below 2. */
export function nextTBasedSampleSize(n: number, cv: number, relativeError: number, confidence = 0.95): number {
  if (!Number.isInteger(n) || n < MINIMUM_SAMPLE_SIZE) throw new RangeError(`n must be a whole number ≥ 2, got ${n}`)
  const t = studentTQuantile(twoSidedProbability(confidence), n - 1)
  return Math.max(MINIMUM_SAMPLE_SIZE, roundUpSampleSize(normalApproxSampleSize(cv, relativeError, t)))
}

/**
 * Number of fish (or units) to measure so the mean is known within ±relativeError of itself at the
 * given confidence, for a population with coefficient of variation `cv` (both fractions: 0.3, 0.1).
 *
 * Method (Krebs 1998 ch. 5; Zar 2007 ch. 8): start from the normal answer ⌈(z·CV/E)²⌉, then recompute
 * with Student's t at n − 1 degrees of freedom until a value repeats. The update never increases when n
 * increases (t shrinks as df grows), so the sequence settles on one value or alternates between two;
 * when it alternates the larger is returned, as the larger is the one that meets the precision.
 */
export function sampleSizeForMean(cv: number, relativeError: number, confidence = 0.95): number {
  requirePositiveFraction(cv, 'Coefficient of variation')
  requirePositiveFraction(relativeError, 'Relative error')
  const z = normalQuantile(twoSidedProbability(confidence))
  let n = Math.max(MINIMUM_SAMPLE_SIZE, roundUpSampleSize(normalApproxSampleSize(cv, relativeError, z)))
  const visited: number[] = []
  // The argument above bounds the loop; the cap only guards against a defect elsewhere.
  for (let step = 0; step < 1000; step++) {
    const firstVisit = visited.indexOf(n)
    if (firstVisit >= 0) return Math.max(...visited.slice(firstVisit))
    visited.push(n)
    n = nextTBasedSampleSize(n, cv, relativeError, confidence)
  }
  throw new Error('Sample-size iteration did not settle')
}
