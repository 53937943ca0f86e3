/**
 * Dissolved-oxygen solubility in water in equilibrium with water-saturated air.
 *
 * Equations: Benson, B.B. & Krause, D. (1984) Limnol. Oceanogr. 29(3):620-632, in the form adopted by
 * USGS Office of Water Quality Technical Memorandum 2011.03 (DOTABLES) and by Standard Methods 4500-O:
 *   C = C0 · Fs · Fp   (mg/L)
 * C0 fresh water at 1 atm, Fs the salinity factor, Fp the barometric-pressure factor.
 */
import { requireConcentration, requireWithinRange, type ValidRange } from './valid-range'

export const STANDARD_PRESSURE_KPA = 101.325
const KELVIN_OFFSET = 273.15

/** Benson & Krause (1984) fitted their measurements over 0–40 °C. */
export const OXYGEN_TEMPERATURE_RANGE_C: ValidRange = {
  quantity: 'Temperature',
  unit: '°C',
  min: 0,
  max: 40,
  basis: 'the Benson & Krause equation',
}

/** Salinity 0–40 (g/kg; practical salinity is used interchangeably, as USGS and Standard Methods do). */
export const OXYGEN_SALINITY_RANGE_G_PER_KG: ValidRange = {
  quantity: 'Salinity',
  unit: 'g/kg',
  min: 0,
  max: 40,
  basis: 'the Benson & Krause equation',
}

/**
 * The pressure correction is stated for 0.5–1.1 atm (50.66–111.46 kPa); the limits are rounded inward to
 * whole kPa so the UI can print them plainly. Sea level to roughly 5 000 m elevation fits inside.
 */
export const BAROMETRIC_PRESSURE_RANGE_KPA: ValidRange = {
  quantity: 'Barometric pressure',
  unit: 'kPa',
  min: 51,
  max: 111,
  basis: 'the Benson & Krause pressure correction (0.5–1.1 atm)',
}

export const DISSOLVED_OXYGEN_UNIT = 'mg/L'

/** Benson & Krause (1984): ln C0 for fresh water at 1 atm, mg/L; T in kelvin. */
function freshwaterSolubilityAtOneAtmosphere(kelvin: number): number {
  const lnC0 = -139.34411 + 1.575701e5 / kelvin - 6.642308e7 / kelvin ** 2 + 1.2438e10 / kelvin ** 3 - 8.621949e11 / kelvin ** 4
  return Math.exp(lnC0)
}

/** Benson & Krause (1984) salinity factor Fs; S in g/kg. */
function salinityFactor(kelvin: number, salinity: number): number {
  return Math.exp(-salinity * (0.017674 - 10.754 / kelvin + 2140.7 / kelvin ** 2))
}

/**
 * Pressure factor Fp = ((P − u)(1 − θP)) / ((1 − u)(1 − θ)), P in atm, as given in USGS TM 2011.03:
 * u = water-vapour pressure (atm) = exp(11.8571 − 3840.70/T − 216961/T²),
 * θ = 0.000975 − 1.426e-5·t + 6.436e-8·t² (second virial coefficient term of oxygen).
 */
function pressureFactor(tempC: number, pressureAtm: number): number {
  const kelvin = tempC + KELVIN_OFFSET
  const waterVapourAtm = Math.exp(11.8571 - 3840.7 / kelvin - 216961 / kelvin ** 2)
  const theta = 0.000975 - 1.426e-5 * tempC + 6.436e-8 * tempC ** 2
  return ((pressureAtm - waterVapourAtm) * (1 - theta * pressureAtm)) / ((1 - waterVapourAtm) * (1 - theta))
}

/** Oxygen solubility in mg/L at the given water temperature (°C), salinity (g/kg) and barometric pressure (kPa). */
export function oxygenSolubilityMgL(tempC: number, salinity: number, pressureKpa = STANDARD_PRESSURE_KPA): number {
  requireWithinRange(tempC, OXYGEN_TEMPERATURE_RANGE_C)
  requireWithinRange(salinity, OXYGEN_SALINITY_RANGE_G_PER_KG)
  requireWithinRange(pressureKpa, BAROMETRIC_PRESSURE_RANGE_KPA)
  const kelvin = tempC + KELVIN_OFFSET
  return freshwaterSolubilityAtOneAtmosphere(kelvin) * salinityFactor(kelvin, salinity) * pressureFactor(tempC, pressureKpa / STANDARD_PRESSURE_KPA)
}

/** Measured dissolved oxygen as a percentage of the solubility under the same conditions (100 % = saturated). */
export function oxygenPercentSaturation(doMgL: number, tempC: number, salinity: number, pressureKpa = STANDARD_PRESSURE_KPA): number {
  requireConcentration(doMgL, 'Dissolved oxygen', DISSOLVED_OXYGEN_UNIT)
  return (100 * doMgL) / oxygenSolubilityMgL(tempC, salinity, pressureKpa)
}
