import type { Band } from '#shared/schemas/parameter'

export interface Bounds {
  okMin: number | null
  okMax: number | null
  criticalMin: number | null
  criticalMax: number | null
}

/** One shaded strip of a chart, in data units, bottom to top. */
export interface BandArea {
  band: Band
  y1: number
  y2: number
}

const limitsOf = (b: Bounds) => [b.okMin, b.okMax, b.criticalMin, b.criticalMax].filter((v): v is number => v != null)

/**
 * The strips from bottom to top: critical, watch, ok, watch, critical, as far as the limits go.
 * Every edge is a number: recharts reads a missing y1 as the top of the plot, not the bottom.
 */
export function bandAreas(b: Bounds | undefined, [lo, hi]: [number, number]): BandArea[] {
  if (!b || limitsOf(b).length === 0) return []
  const areas: BandArea[] = []
  if (b.criticalMin != null) areas.push({ band: 'critical', y1: lo, y2: b.criticalMin })
  if (b.okMin != null) areas.push({ band: 'watch', y1: b.criticalMin ?? lo, y2: b.okMin })
  areas.push({ band: 'ok', y1: b.okMin ?? lo, y2: b.okMax ?? hi })
  if (b.okMax != null) areas.push({ band: 'watch', y1: b.okMax, y2: b.criticalMax ?? hi })
  if (b.criticalMax != null) areas.push({ band: 'critical', y1: b.criticalMax, y2: hi })
  // A limit at the next one (e.g. critical = ok) or at the axis's end leaves an empty strip.
  return areas.map((a) => ({ ...a, y1: Math.max(lo, a.y1), y2: Math.min(hi, a.y2) })).filter((a) => a.y2 > a.y1)
}

function niceStep(rough: number) {
  const power = 10 ** Math.floor(Math.log10(rough))
  const fraction = rough / power
  return (fraction <= 1 ? 1 : fraction <= 2 ? 2 : fraction <= 2.5 ? 2.5 : fraction <= 5 ? 5 : 10) * power
}

const tidy = (v: number) => Number(v.toPrecision(12))

/** A value axis on round numbers that shows every reading and every limit, with a little room around them. */
export function valueScale(values: number[], b: Bounds | undefined): { domain: [number, number]; ticks: number[] } {
  const marks = [...values, ...(b ? limitsOf(b) : [])]
  const lo = marks.length ? Math.min(...marks) : 0
  const hi = marks.length ? Math.max(...marks) : 1
  const pad = (hi - lo || Math.abs(hi) || 1) * 0.08
  const step = niceStep((hi - lo + 2 * pad) / 5)
  const start = lo >= 0 ? Math.max(0, Math.floor((lo - pad) / step) * step) : Math.floor((lo - pad) / step) * step
  const end = Math.ceil((hi + pad) / step) * step
  const ticks: number[] = []
  for (let v = start; v <= end + step / 2; v += step) ticks.push(tidy(v))
  return { domain: [tidy(start), tidy(end)], ticks }
}
