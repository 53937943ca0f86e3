import type { Band } from '#shared/schemas/parameter'

export interface Bounds {
  okMin: number | null
  okMax: number | null
  criticalMin: number | null
  criticalMax: number | null
}

/** One shaded strip of a chart; a missing edge runs to the edge of the plot. */
export interface BandArea {
  band: Band
  y1?: number
  y2?: number
}

const limitsOf = (b: Bounds) => [b.okMin, b.okMax, b.criticalMin, b.criticalMax].filter((v): v is number => v != null)

/** The strips from bottom to top: critical, watch, ok, watch, critical, as far as the limits go. */
export function bandAreas(b: Bounds | undefined): BandArea[] {
  if (!b || limitsOf(b).length === 0) return []
  const areas: BandArea[] = []
  if (b.criticalMin != null) areas.push({ band: 'critical', y2: b.criticalMin })
  if (b.okMin != null) areas.push({ band: 'watch', y1: b.criticalMin ?? undefined, y2: b.okMin })
  areas.push({ band: 'ok', y1: b.okMin ?? undefined, y2: b.okMax ?? undefined })
  if (b.okMax != null) areas.push({ band: 'watch', y1: b.okMax, y2: b.criticalMax ?? undefined })
  if (b.criticalMax != null) areas.push({ band: 'critical', y1: b.criticalMax })
  // A limit at or beyond the next one (e.g. critical = ok) leaves an empty strip.
  return areas.filter((a) => a.y1 === undefined || a.y2 === undefined || a.y2 > a.y1)
}

/** A value axis that shows every reading and every limit, with a little room around them. */
export function valueDomain(values: number[], b: Bounds | undefined): [number, number] {
  const marks = [...values, ...(b ? limitsOf(b) : [])]
  if (marks.length === 0) return [0, 1]
  const lo = Math.min(...marks)
  const hi = Math.max(...marks)
  const pad = (hi - lo || Math.abs(hi) || 1) * 0.12
  const niceLo = lo >= 0 ? Math.max(0, lo - pad) : lo - pad
  return [round(niceLo), round(hi + pad)]
}

const round = (v: number) => Number(v.toPrecision(3))
