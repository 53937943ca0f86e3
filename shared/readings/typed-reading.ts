import type { Band } from '../schemas/parameter'
import { bandFor, type Bounds } from './band'

/** What a reading may physically be: the one range every check of a typed value uses. */
export interface PhysicalRange {
  unit: string
  physicalMin: number
  physicalMax: number
}

/** Why a value cannot be a real reading of this parameter ("Not possible: must be 0–30 °C"), or null. */
export function impossibleReading(value: number, range: PhysicalRange): string | null {
  if (value >= range.physicalMin && value <= range.physicalMax) return null
  return `Not possible: must be ${range.physicalMin}–${range.physicalMax}${range.unit ? ` ${range.unit}` : ''}`
}

export type ReadingCheck = { state: 'empty' } | { state: 'invalid'; message: string } | { state: 'valid'; value: number; band: Band }

/**
 * The round's and the paper sheet's judgement of what was typed, the same the server makes:
 * a plain decimal number (a decimal comma is fine), physically possible, banded against the limits.
 */
export function checkTypedReading(raw: string, spec: PhysicalRange & Bounds): ReadingCheck {
  const text = raw.trim().replace(',', '.')
  if (text === '') return { state: 'empty' }
  const value = Number(text)
  if (!/^[-+]?(\d+\.?\d*|\.\d+)$/.test(text) || !Number.isFinite(value)) return { state: 'invalid', message: 'Enter a number' }
  const impossible = impossibleReading(value, spec)
  if (impossible) return { state: 'invalid', message: impossible }
  return { state: 'valid', value, band: bandFor(value, spec) }
}
