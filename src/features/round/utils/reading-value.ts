import type { Band } from '#shared/schemas/parameter'
import type { ReadingSpec } from '#shared/schemas/round'

/** Why a watch or critical value is out: "below 4 mg/L", "above 10.5 mg/L". */
export function bandReason(value: number, band: Band, spec: ReadingSpec): string | null {
  if (band === 'ok') return null
  const low = band === 'critical' ? spec.criticalMin : spec.okMin
  const high = band === 'critical' ? spec.criticalMax : spec.okMax
  if (low != null && value < low) return `below ${low} ${spec.unit}`
  if (high != null && value > high) return `above ${high} ${spec.unit}`
  return null
}
