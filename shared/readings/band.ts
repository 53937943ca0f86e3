import type { Band, Limit } from '../schemas/parameter'

export type Bounds = Pick<Limit, 'okMin' | 'okMax' | 'criticalMin' | 'criticalMax'>

/**
 * Inside [okMin, okMax] is ok; outside that but inside [criticalMin, criticalMax] is watch;
 * beyond a critical limit is critical. A missing limit means no limit on that side.
 */
export function bandFor(value: number, limit: Bounds | undefined): Band {
  if (!limit) return 'ok'
  if ((limit.criticalMin != null && value < limit.criticalMin) || (limit.criticalMax != null && value > limit.criticalMax)) return 'critical'
  if ((limit.okMin != null && value < limit.okMin) || (limit.okMax != null && value > limit.okMax)) return 'watch'
  return 'ok'
}

/** The limit that applies to one place: a batch's override wins over its system's, which wins over the facility's. */
export function pickLimit(limits: readonly Limit[], parameterKey: string, where: { systemId: number | null; batchIds: number[] }): Limit | undefined {
  const own = limits.filter((l) => l.parameterKey === parameterKey)
  return (
    own.find((l) => l.scope === 'batch' && l.scopeId != null && where.batchIds.includes(l.scopeId)) ??
    own.find((l) => l.scope === 'system' && l.scopeId === where.systemId) ??
    own.find((l) => l.scope === 'facility')
  )
}

const ORDER: Record<Band, number> = { ok: 0, watch: 1, critical: 2 }
export const worstBand = (bands: Band[]): Band => bands.reduce<Band>((worst, b) => (ORDER[b] > ORDER[worst] ? b : worst), 'ok')

/** "5.0–10.5 mg/L", "≥ 5", "≤ 0.02": the ok range as a person reads it. */
export function describeOkRange(limit: Bounds | undefined, unit = ''): string | null {
  if (!limit || (limit.okMin == null && limit.okMax == null)) return null
  const u = unit ? ` ${unit}` : ''
  if (limit.okMin != null && limit.okMax != null) return `${limit.okMin}–${limit.okMax}${u}`
  return limit.okMin != null ? `≥ ${limit.okMin}${u}` : `≤ ${limit.okMax}${u}`
}
