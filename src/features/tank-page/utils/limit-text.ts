import type { Bounds } from './band-areas'

const u = (unit: string) => (unit ? ` ${unit}` : '')

export function okText(b: Bounds, unit: string) {
  if (b.okMin != null && b.okMax != null) return `${b.okMin}–${b.okMax}${u(unit)}`
  if (b.okMin != null) return `${b.okMin}${u(unit)} or more`
  if (b.okMax != null) return `up to ${b.okMax}${u(unit)}`
  return 'any value'
}

export function criticalText(b: Bounds, unit: string) {
  const parts = [b.criticalMin != null && `below ${b.criticalMin}${u(unit)}`, b.criticalMax != null && `above ${b.criticalMax}${u(unit)}`].filter(Boolean)
  return parts.length ? parts.join(' or ') : 'no critical limit'
}

export const hasLimits = (b: Bounds) => [b.okMin, b.okMax, b.criticalMin, b.criticalMax].some((v) => v != null)
