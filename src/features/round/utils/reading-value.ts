import { bandFor } from '#shared/readings/band'
import type { Band } from '#shared/schemas/parameter'
import type { ReadingSpec } from '#shared/schemas/round'

export type ReadingCheck =
  | { state: 'empty' }
  | { state: 'invalid'; message: string }
  | { state: 'valid'; value: number; band: Band }

/** Parses what was typed (a decimal comma is fine) and bands it against the task's limits. */
export function checkReading(raw: string, spec: ReadingSpec): ReadingCheck {
  const text = raw.trim().replace(',', '.')
  if (text === '') return { state: 'empty' }
  const value = Number(text)
  if (!/^[-+]?(\d+\.?\d*|\.\d+)$/.test(text) || !Number.isFinite(value)) return { state: 'invalid', message: 'Enter a number' }
  if (value < spec.physicalMin || value > spec.physicalMax) {
    return { state: 'invalid', message: `Not possible: must be ${spec.physicalMin}–${spec.physicalMax} ${spec.unit}` }
  }
  return { state: 'valid', value, band: bandFor(value, spec) }
}

/** Why a watch or critical value is out: "below 4 mg/L", "above 10.5 mg/L". */
export function bandReason(value: number, band: Band, spec: ReadingSpec): string | null {
  if (band === 'ok') return null
  const low = band === 'critical' ? spec.criticalMin : spec.okMin
  const high = band === 'critical' ? spec.criticalMax : spec.okMax
  if (low != null && value < low) return `below ${low} ${spec.unit}`
  if (high != null && value > high) return `above ${high} ${spec.unit}`
  return null
}
