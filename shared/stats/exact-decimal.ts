/**
 * Exact sums of decimal measurements.
 *
 * A reading such as 10000000.1 g cannot be stored exactly as a binary double: the stored value is off by
 * up to half a unit in the last place. For data sets with a large mean and a tiny spread (NIST StRD
 * NumAcc4: 10000000.1 … 10000000.3) those storage errors alone move the SD by about 6e-9 relative, so
 * no floating-point algorithm can recover the certified value from the doubles. Each value is therefore
 * read back as the shortest decimal that round-trips to it — the number as it was typed — and the sums
 * are formed exactly with BigInt. The only rounding left is the final conversion to a double.
 */

/** value = digits × 10^exponent, exactly. */
type ExactDecimal = { digits: bigint; exponent: number }

/** Matches JavaScript's shortest round-trip form: "-12.5", "3", "1.5e-7", "2e+21". */
const NUMBER_TEXT = /^(-?)(\d+)(?:\.(\d+))?(?:e([+-]\d+))?$/

function toExactDecimal(value: number): ExactDecimal {
  const match = NUMBER_TEXT.exec(String(value))
  if (!match) throw new RangeError(`Cannot read ${value} as a decimal`)
  const [, sign, whole, fraction = '', exponentText = '0'] = match
  const digits = BigInt(`${sign}${whole}${fraction}`)
  return { digits, exponent: Number(exponentText) - fraction.length }
}

function powerOfTen(exponent: number): bigint {
  return 10n ** BigInt(exponent)
}

/**
 * numerator / denominator × 10^exponent as the nearest double. The integer quotient is taken to at
 * least 20 significant digits, so truncating it costs under 1e-19 relative before the final rounding.
 */
function ratioToNumber(numerator: bigint, denominator: bigint, exponent: number): number {
  if (numerator === 0n) return 0
  const negative = numerator < 0n
  const magnitude = negative ? -numerator : numerator
  const digitGap = magnitude.toString().length - denominator.toString().length
  const shift = Math.max(0, 20 - digitGap)
  const quotient = (magnitude * powerOfTen(shift)) / denominator
  const value = Number(`${quotient}e${exponent - shift}`)
  return negative ? -value : value
}

/**
 * √(numerator / denominator × 10^exponent) for an even exponent, without forming the square first:
 * the variance of values near 1e300 overflows a double although their SD does not.
 */
function sqrtOfRatioToNumber(numerator: bigint, denominator: bigint, exponent: number): number {
  if (numerator === 0n) return 0
  const digitGap = numerator.toString().length - denominator.toString().length
  // Pull an even power of ten out so the remaining ratio sits comfortably inside double range.
  const evenShift = 2 * Math.floor(digitGap / 2)
  const scaledRatio = ratioToNumber(numerator, denominator, -evenShift)
  return Number(`${Math.sqrt(scaledRatio)}e${(exponent + evenShift) / 2}`)
}

export type ExactMoments = { count: number; mean: number; sd: number }

/**
 * Mean and sample standard deviation (n − 1 divisor) of finite values, exact up to the final rounding:
 * sd² = (n Σx² − (Σx)²) / (n (n − 1)). sd is NaN when there is a single value.
 */
export function exactMoments(values: readonly number[]): ExactMoments {
  const count = values.length
  if (count === 0) throw new RangeError('exactMoments needs at least one value')
  const decimals = values.map(toExactDecimal)
  // A loop rather than Math.min(...spread): large samples would overflow the argument list.
  const commonExponent = decimals.reduce((lowest, decimal) => Math.min(lowest, decimal.exponent), Infinity)
  let sum = 0n
  let sumOfSquares = 0n
  for (const decimal of decimals) {
    const scaled = decimal.digits * powerOfTen(decimal.exponent - commonExponent)
    sum += scaled
    sumOfSquares += scaled * scaled
  }
  const n = BigInt(count)
  const mean = ratioToNumber(sum, n, commonExponent)
  if (count === 1) return { count, mean, sd: Number.NaN }
  const sd = sqrtOfRatioToNumber(n * sumOfSquares - sum * sum, n * (n - 1n), 2 * commonExponent)
  return { count, mean, sd }
}
