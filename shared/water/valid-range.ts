/**
 * The inputs a water-chemistry equation was fitted or validated for. Exported ranges let the UI
 * show the limits next to a field; the calculators refuse values outside them instead of
 * extrapolating an empirical fit.
 */
export type ValidRange = Readonly<{
  /** What the value is, as a technician would say it: 'Temperature', 'Salinity'. */
  quantity: string
  /** Unit shown after numbers; '' for dimensionless quantities such as pH. */
  unit: string
  min: number
  max: number
  /** Why these limits apply, phrased to follow "the range of": 'the Benson & Krause equation'. */
  basis: string
}>

const withUnit = (value: number | string, unit: string) => (unit === '' ? `${value}` : `${value} ${unit}`)

export function describeRange(range: ValidRange): string {
  return withUnit(`${range.min}–${range.max}`, range.unit)
}

/** Returns the value when it lies in the closed range; otherwise throws an Error naming the input and the range. */
export function requireWithinRange(value: number, range: ValidRange): number {
  if (!Number.isFinite(value)) {
    throw new Error(`${range.quantity} must be a number (got ${value}); ${describeRange(range)} is the range of ${range.basis}`)
  }
  if (value < range.min || value > range.max) {
    const reading = withUnit(value, range.unit)
    throw new Error(`${range.quantity} ${reading} is outside ${describeRange(range)}, the range of ${range.basis}`)
  }
  return value
}

/** Concentrations have no upper limit (supersaturation is real) but cannot be negative. */
export function requireConcentration(value: number, quantity: string, unit: string): number {
  if (!Number.isFinite(value)) {
    throw new Error(`${quantity} must be a number (got ${value}); a concentration is 0 ${unit} or more`)
  }
  if (value < 0) {
    throw new Error(`${quantity} ${withUnit(value, unit)} is negative; a concentration is 0 ${unit} or more`)
  }
  return value
}
