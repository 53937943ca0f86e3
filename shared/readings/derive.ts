import { unionizedAmmoniaMgL } from '../water/ammonia'
import { oxygenPercentSaturation } from '../water/oxygen'

export interface DerivedResult {
  values: Record<string, number>
  /** Why a derived value could not be worked out (e.g. a temperature outside the method's range). */
  notes: string[]
}

const round = (v: number, decimals: number) => Math.round(v * 10 ** decimals) / 10 ** decimals

/**
 * Values worked out from the readings typed in: DO % saturation from DO, temperature and
 * salinity; un-ionised NH3-N from total ammonia-N, pH, temperature and salinity. Salinity
 * falls back to the system's set-point, then to fresh water.
 */
export function deriveReadings(readings: Record<string, number>, salinitySetpoint: number | null = null): DerivedResult {
  const values: Record<string, number> = {}
  const notes: string[] = []
  const temp = readings.temp_c
  const salinity = readings.salinity ?? salinitySetpoint ?? 0
  if (readings.do_mgL !== undefined && temp !== undefined) {
    try {
      values.do_pct = round(oxygenPercentSaturation(readings.do_mgL, temp, salinity), 1)
    } catch (err) {
      notes.push(`DO saturation not worked out: ${(err as Error).message}`)
    }
  }
  if (readings.tan_mgL !== undefined && readings.ph !== undefined && temp !== undefined) {
    try {
      values.nh3_mgL = round(unionizedAmmoniaMgL(readings.tan_mgL, readings.ph, temp, salinity), 4)
    } catch (err) {
      notes.push(`Un-ionised ammonia not worked out: ${(err as Error).message}`)
    }
  }
  return { values, notes }
}
