/**
 * Oxygen left in a compressed-gas cylinder and how long it lasts at the current flow.
 *
 * Two ways to describe a cylinder, chosen per cylinder in its settings:
 *  - psi factor: litres per psi of gauge pressure (the "cylinder factor" of the supplier or of a
 *    published table). minutes = (gauge psi − reserve psi) × factor / flow (L/min).
 *    Virginia Office of EMS 'Oxygen Cylinder Guidance' (2010).
 *  - metric: water capacity (L) × pressure (bar). Free gas at 1.01325 bar, same temperature:
 *    free L = capacity × (p_abs / Z) / (p_ref / Z_ref), p_abs = gauge bar + 1.01325. Z = 1 is the ideal
 *    gas. Oxygen's Z at 137–230 bar and 15–20 °C is 0.93–0.95 (reference equation of state, Schmidt &
 *    Wagner 1985), so the ideal figure understates the contents by roughly 6–8 %.
 * Both leave the reserve pressure in the cylinder: time is counted down to the reserve, not to empty.
 */

/** Standard atmosphere in bar; converts gauge to absolute pressure and is the reference pressure. */
export const STANDARD_ATMOSPHERE_BAR = 1.01325

/** The "safe residual" the psi-factor guidance subtracts (Virginia Office of EMS, 2010). */
export const PUBLISHED_SAFE_RESIDUAL_PSI = 200

/** Factors printed in the psi-factor guidance; a starting point for a cylinder's own setting. */
export const PUBLISHED_PSI_FACTORS = {
  source:
    "Virginia Office of EMS 'Oxygen Cylinder Guidance' (developed October 2010): duration (min) = " +
    '(tank pressure psi - 200) x cylinder conversion factor / flow (L/min).',
  caveat:
    'Other tables give other factors for the same size (e.g. an E cylinder rated 660 L at 1900 psi is ' +
    '0.347 L/psi, not 0.28); use the figure for your own cylinder.',
  factors: [
    { size: 'D', factorLPerPsi: 0.16 },
    { size: 'E', factorLPerPsi: 0.28 },
    { size: 'M', factorLPerPsi: 1.56 },
    { size: 'H/K', factorLPerPsi: 3.14 },
  ],
} as const

export type PsiFactorCylinder = {
  method: 'psi-factor'
  /** Litres of free gas per psi on the gauge; differs between sources for the same size, so set per cylinder. */
  factorLPerPsi: number
  reservePsi: number
}

export type CompressibilityFactors = {
  /** Z at the pressure being read (and the cylinder's temperature). */
  atReading: number
  /** Z at the reserve pressure; near 1 at low pressure, so 1 when not given. */
  atReserve?: number
  /** Z at 1.01325 bar, the state free gas is referred to; 1 when not given (0.9992 for O₂ at 15 °C). */
  atReference?: number
}

export type MetricCylinder = {
  method: 'metric'
  waterCapacityL: number
  reserveBar: number
  /** Omit for the ideal-gas estimate. */
  compressibility?: CompressibilityFactors
}

export type CylinderSettings = PsiFactorCylinder | MetricCylinder

export type SupplyReading = {
  /** Gauge pressure in the cylinder's unit: psi for psi-factor cylinders, bar for metric ones. */
  gaugePressure: number
  flowLPerMin: number
}

export type SupplyEstimate = {
  /** Free gas in the cylinder at this reading. */
  gasLeftL: number
  /** Free gas that can be drawn before the gauge reaches the reserve pressure; 0 at or below it. */
  usableL: number
  minutesToReserve: number
  hoursToReserve: number
  atOrBelowReserve: boolean
}

function requireFinite(value: number, name: string): void {
  if (!Number.isFinite(value)) throw new RangeError(`${name} must be a number, got ${value}`)
}

function requirePositive(value: number, name: string): void {
  requireFinite(value, name)
  if (value <= 0) throw new RangeError(`${name} must be above 0, got ${value}`)
}

function requireNotNegative(value: number, name: string): void {
  requireFinite(value, name)
  if (value < 0) throw new RangeError(`${name} cannot be negative, got ${value}`)
}

/** The pressure unit a cylinder's gauge reading and reserve are entered in. */
export function pressureUnitFor(cylinder: CylinderSettings): 'psi' | 'bar' {
  return cylinder.method === 'psi-factor' ? 'psi' : 'bar'
}

/** Factor from rated contents: e.g. 660 L at a 1900 psi service pressure → 0.347 L/psi. */
export function psiFactorFromRatedContents(ratedContentsL: number, servicePressurePsi: number): number {
  requirePositive(ratedContentsL, 'Rated contents (L)')
  requirePositive(servicePressurePsi, 'Service pressure (psi)')
  return ratedContentsL / servicePressurePsi
}

/** Free gas (L at 1.01325 bar) in a cylinder of `waterCapacityL` at `gaugeBar`, with p/Z scaling. */
export function metricFreeGasL(waterCapacityL: number, gaugeBar: number, z = 1, zReference = 1): number {
  requirePositive(waterCapacityL, 'Water capacity (L)')
  requireNotNegative(gaugeBar, 'Gauge pressure (bar)')
  requirePositive(z, 'Compressibility factor Z')
  requirePositive(zReference, 'Reference compressibility factor Z')
  const absoluteBar = gaugeBar + STANDARD_ATMOSPHERE_BAR
  return (waterCapacityL * (absoluteBar / z)) / (STANDARD_ATMOSPHERE_BAR / zReference)
}

function contentsAndUsable(cylinder: CylinderSettings, gauge: number): { gasLeftL: number; usableL: number } {
  if (cylinder.method === 'psi-factor') {
    requirePositive(cylinder.factorLPerPsi, 'Cylinder factor (L/psi)')
    requireNotNegative(cylinder.reservePsi, 'Reserve pressure (psi)')
    const usableL = Math.max(0, gauge - cylinder.reservePsi) * cylinder.factorLPerPsi
    return { gasLeftL: gauge * cylinder.factorLPerPsi, usableL }
  }
  requireNotNegative(cylinder.reserveBar, 'Reserve pressure (bar)')
  const z = cylinder.compressibility
  const zReference = z?.atReference ?? 1
  const gasLeftL = metricFreeGasL(cylinder.waterCapacityL, gauge, z?.atReading ?? 1, zReference)
  if (gauge <= cylinder.reserveBar) return { gasLeftL, usableL: 0 }
  const atReserveL = metricFreeGasL(cylinder.waterCapacityL, cylinder.reserveBar, z?.atReserve ?? 1, zReference)
  return { gasLeftL, usableL: Math.max(0, gasLeftL - atReserveL) }
}

/**
 * Gas left and time until the gauge reaches the cylinder's reserve pressure at a steady flow.
 * A reading at or below the reserve gives 0 time, not a negative one. A flow of 0 is rejected: with
 * nothing flowing there is no countdown to show, and dividing by it would print "Infinity".
 */
export function estimateSupply(cylinder: CylinderSettings, reading: SupplyReading): SupplyEstimate {
  const unit = pressureUnitFor(cylinder)
  requireNotNegative(reading.gaugePressure, `Gauge pressure (${unit})`)
  requirePositive(reading.flowLPerMin, 'Flow (L/min)')
  const { gasLeftL, usableL } = contentsAndUsable(cylinder, reading.gaugePressure)
  const minutesToReserve = usableL / reading.flowLPerMin
  return {
    gasLeftL,
    usableL,
    minutesToReserve,
    hoursToReserve: minutesToReserve / 60,
    atOrBelowReserve: usableL === 0,
  }
}
