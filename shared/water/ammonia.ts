/**
 * Un-ionised ammonia (NH3): the share of total ammonia nitrogen (TAN = NH3-N + NH4+-N) present as NH3.
 * f = 1 / (1 + 10^(pKa − pH)); only pKa depends on the water.
 *
 * Which pKa is used, decided by salinity alone:
 * - salinity exactly 0 → fresh water: Emerson, Russo, Lund & Thurston (1975) J. Fish. Res. Board Can.
 *   32:2379-2383, valid 0–50 °C; pH as read on a meter calibrated with ordinary (NBS/IUPAC) buffers.
 * - salinity above 0 up to 40 → brackish and sea water: Clegg & Whitfield (1995) Geochim. Cosmochim. Acta
 *   59(12):2403-2421, total-hydrogen-ion-scale fit, valid −2 to 40 °C and salinity 0–40 (range as stated
 *   with the published implementation of these coefficients, R package wql, function ammFrac).
 *   pH must be on the total scale; a meter calibrated with NBS buffers reads sea water on a different
 *   scale, and the difference can be of the order of 0.1 pH unit, which changes NH3 by about 25 %.
 *
 * There is no gap between the two methods: the saline fit is valid from salinity 0, so any salinity above
 * 0 uses it. At salinity 0 the two agree to within 0.5 % of the NH3 share (to within 2 % at 0.1 g/kg), so
 * a trace of salt does not make the result jump.
 *
 * The saline fit was chosen over the Khoo et al. (1977) / Bower & Bidwell (1978) form because it comes
 * with published check values, and Bell et al. (2007) Environ. Chem. 4:183-186 report that the Khoo
 * expression can overstate NH3 by up to 500 %.
 */
import { requireConcentration, requireWithinRange, type ValidRange } from './valid-range'

const KELVIN_OFFSET = 273.15

export const AMMONIA_METHOD_NAMES = {
  freshwater: 'Emerson et al. (1975)',
  saline: 'Clegg & Whitfield (1995), total pH scale',
} as const

export type AmmoniaMethod = keyof typeof AMMONIA_METHOD_NAMES

export const FRESHWATER_AMMONIA_TEMPERATURE_RANGE_C: ValidRange = {
  quantity: 'Temperature',
  unit: '°C',
  min: 0,
  max: 50,
  basis: 'the Emerson et al. (1975) fresh-water ammonia equation',
}

export const SALINE_AMMONIA_TEMPERATURE_RANGE_C: ValidRange = {
  quantity: 'Temperature',
  unit: '°C',
  min: -2,
  max: 40,
  basis: 'the Clegg & Whitfield (1995) saline ammonia equation',
}

/** Salinity in g/kg (practical salinity used interchangeably); 0 selects the fresh-water equation. */
export const AMMONIA_SALINITY_RANGE_G_PER_KG: ValidRange = {
  quantity: 'Salinity',
  unit: 'g/kg',
  min: 0,
  max: 40,
  basis: 'the Clegg & Whitfield (1995) saline ammonia equation',
}

/** The equilibrium expression holds at any pH; the limits only reject numbers that cannot be a pH reading. */
export const PH_RANGE: ValidRange = {
  quantity: 'pH',
  unit: '',
  min: 0,
  max: 14,
  basis: 'the pH scale',
}

export function ammoniaMethodFor(salinity: number): AmmoniaMethod {
  requireWithinRange(salinity, AMMONIA_SALINITY_RANGE_G_PER_KG)
  return salinity === 0 ? 'freshwater' : 'saline'
}

/** Emerson et al. (1975): pKa = 0.09018 + 2729.92 / T, T in kelvin. */
function freshwaterPKa(tempC: number): number {
  requireWithinRange(tempC, FRESHWATER_AMMONIA_TEMPERATURE_RANGE_C)
  return 0.09018 + 2729.92 / (tempC + KELVIN_OFFSET)
}

/** Clegg & Whitfield (1995) pKa* of NH4+ in sea water, total pH scale; T in kelvin, S salinity. */
function salinePKa(tempC: number, salinity: number): number {
  requireWithinRange(tempC, SALINE_AMMONIA_TEMPERATURE_RANGE_C)
  const T = tempC + KELVIN_OFFSET
  const rootT = Math.sqrt(T)
  return (
    9.244605 -
    2729.33 * (1 / 298.15 - 1 / T) +
    (0.04203362 - 11.24742 / T) * salinity ** 0.25 +
    (-13.6416 + 1.176949 * rootT - 0.02860785 * T + 545.4834 / T) * salinity ** 0.5 +
    (-0.1462507 + 0.009022648 * rootT - 1.471361e-4 * T + 10.5425 / T) * salinity ** 1.5 +
    (0.004669309 - 1.691742e-4 * rootT - 0.5677934 / T) * salinity ** 2 +
    (-2.354039e-5 + 0.009698623 / T) * salinity ** 2.5
  )
}

/** Fraction (0–1) of total ammonia nitrogen present as un-ionised NH3. Salinity in g/kg, 0 = fresh water. */
export function unionizedAmmoniaFraction(pH: number, tempC: number, salinity = 0): number {
  requireWithinRange(pH, PH_RANGE)
  const pKa = ammoniaMethodFor(salinity) === 'freshwater' ? freshwaterPKa(tempC) : salinePKa(tempC, salinity)
  return 1 / (1 + 10 ** (pKa - pH))
}

/**
 * Un-ionised ammonia in the same basis as the TAN given: TAN in mg/L as N gives NH3 in mg/L as N
 * (multiply by 17.031 / 14.007 for mg/L as NH3).
 */
export function unionizedAmmoniaMgL(tanMgL: number, pH: number, tempC: number, salinity = 0): number {
  requireConcentration(tanMgL, 'Total ammonia nitrogen', 'mg/L')
  return tanMgL * unionizedAmmoniaFraction(pH, tempC, salinity)
}
