/**
 * Normal and Student's t distribution functions and their quantiles.
 *
 * CDFs come from the incomplete gamma and beta functions (Abramowitz & Stegun 1964, 26.2.30 and 26.7.1):
 *   Φ(x)      = ½ [1 + P(½, x²/2)]                       for x ≥ 0
 *   F_ν(t)    = 1 − ½ I_{ν/(ν+t²)}(ν/2, ½)               for t ≥ 0
 *             = ½ + ½ I_{t²/(ν+t²)}(½, ν/2)              (same, by I_x(a,b) = 1 − I_{1−x}(b,a))
 * Quantiles invert the CDF by bisection: slower than a closed-form approximation but needs no tuned
 * coefficients and is accurate to the CDF itself (about 1e-13 relative here), which is far more than a
 * sample-size calculation can use. The whole file can be swapped for a library inverse without
 * changing its callers: they only use `normalQuantile` and `studentTQuantile`.
 */
import { regularizedIncompleteBeta, regularizedLowerGamma } from './special-functions'

const MAX_BISECTIONS = 200

function requireProbability(p: number): void {
  if (!(p > 0 && p < 1)) throw new RangeError(`Probability must be strictly between 0 and 1, got ${p}`)
}

function requireDegreesOfFreedom(df: number): void {
  if (!(df > 0) || !Number.isFinite(df)) throw new RangeError(`Degrees of freedom must be positive, got ${df}`)
}

/** Standard normal cumulative distribution function Φ(x). */
export function normalCdf(x: number): number {
  if (Number.isNaN(x)) throw new RangeError('normalCdf needs a number, got NaN')
  const halfCentral = 0.5 * regularizedLowerGamma(0.5, (x * x) / 2)
  return x >= 0 ? 0.5 + halfCentral : 0.5 - halfCentral
}

/** Student's t cumulative distribution function with `df` degrees of freedom (df may be fractional). */
export function studentTCdf(t: number, df: number): number {
  requireDegreesOfFreedom(df)
  if (Number.isNaN(t)) throw new RangeError('studentTCdf needs a number, got NaN')
  if (t === 0) return 0.5
  const tSquared = t * t
  // Pass whichever of x = ν/(ν+t²) and 1 − x is the smaller, computed directly: forming 1 − x from a
  // value of x near 1 would throw away digits when ν is large.
  const tail =
    tSquared < df
      ? 0.5 * (1 - regularizedIncompleteBeta(tSquared / (df + tSquared), 0.5, df / 2))
      : 0.5 * regularizedIncompleteBeta(df / (df + tSquared), df / 2, 0.5)
  return t > 0 ? 1 - tail : tail
}

/**
 * The x > 0 where `cdf(x) = p`, for p > ½ and a CDF symmetric about 0. Brackets the root by doubling,
 * then halves the bracket until the two ends are neighbouring doubles.
 */
function invertSymmetricCdf(cdf: (x: number) => number, p: number): number {
  let low = 0
  let high = 1
  while (cdf(high) < p) {
    low = high
    high *= 2
    if (!Number.isFinite(high)) throw new RangeError(`Quantile for p=${p} is beyond the double range`)
  }
  for (let i = 0; i < MAX_BISECTIONS; i++) {
    const middle = low + (high - low) / 2
    if (middle === low || middle === high) break
    if (cdf(middle) < p) low = middle
    else high = middle
  }
  return low + (high - low) / 2
}

/** Standard normal quantile z such that Φ(z) = p. */
export function normalQuantile(p: number): number {
  requireProbability(p)
  if (p === 0.5) return 0
  if (p < 0.5) return -normalQuantile(1 - p)
  return invertSymmetricCdf(normalCdf, p)
}

/** Student's t quantile t such that F_df(t) = p. */
export function studentTQuantile(p: number, df: number): number {
  requireProbability(p)
  requireDegreesOfFreedom(df)
  if (p === 0.5) return 0
  if (p < 0.5) return -studentTQuantile(1 - p, df)
  return invertSymmetricCdf((t) => studentTCdf(t, df), p)
}

/** Two-sided critical value for a confidence level, e.g. 0.95 → the 0.975 quantile. */
export function twoSidedProbability(confidence: number): number {
  if (!(confidence > 0 && confidence < 1)) {
    throw new RangeError(`Confidence must be a fraction between 0 and 1 (e.g. 0.95), got ${confidence}`)
  }
  return (1 + confidence) / 2
}
