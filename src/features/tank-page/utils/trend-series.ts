import type { Band } from '#shared/schemas/parameter'
import type { TankLimit, TrendReading } from '#shared/schemas/tank-page'

export interface TrendPoint {
  t: number
  value: number
  band: Band
}

export interface TrendParameter {
  limit: TankLimit
  tank: TrendPoint[]
  system: TrendPoint[]
}

export const MORTALITY_KEY = 'mortalities'

const points = (readings: TrendReading[], key: string): TrendPoint[] =>
  readings.filter((r) => r.parameterKey === key).map((r) => ({ t: Date.parse(r.takenAt), value: r.value, band: r.band }))

/** The parameters with readings in the range, in the order the limits list them; deaths go to their own bar chart. */
export function trendParameters(limits: TankLimit[], tank: TrendReading[], system: TrendReading[]): TrendParameter[] {
  return limits
    .filter((l) => l.key !== MORTALITY_KEY)
    .map((limit) => ({ limit, tank: points(tank, limit.key), system: points(system, limit.key) }))
    .filter((p) => p.tank.length + p.system.length > 0)
}

/** Measured values first shown; worked-out ones (DO % saturation, NH3) wait to be chosen. */
export function defaultSelection(parameters: TrendParameter[]): string[] {
  return parameters.filter((p) => !p.limit.derived).map((p) => p.limit.key)
}
