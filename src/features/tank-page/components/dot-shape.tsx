import type { Band } from '#shared/schemas/parameter'
import { CHART_COLOURS } from '../utils/chart-colours'

interface DotShapeProps {
  band: Band
  cx: number
  cy: number
  /** The system's readings are drawn hollow, the tank's filled. */
  hollow?: boolean
}

/** A reading's mark: a circle when ok, a diamond for watch, a triangle for critical, so shape alone tells the band. */
export function DotShape({ band, cx, cy, hollow = false }: DotShapeProps) {
  if (band === 'critical') {
    const s = 7
    return (
      <polygon
        className="reading-dot reading-dot-critical"
        points={`${cx},${cy - s} ${cx + s},${cy + s * 0.8} ${cx - s},${cy + s * 0.8}`}
        fill={hollow ? '#fff' : CHART_COLOURS.criticalDot}
        stroke={hollow ? CHART_COLOURS.criticalDot : '#fff'}
        strokeWidth={hollow ? 2 : 1.5}
      />
    )
  }
  if (band === 'watch') {
    const s = 6
    return (
      <polygon
        className="reading-dot reading-dot-watch"
        points={`${cx},${cy - s} ${cx + s},${cy} ${cx},${cy + s} ${cx - s},${cy}`}
        fill={hollow ? '#fff' : CHART_COLOURS.watchDot}
        stroke={hollow ? CHART_COLOURS.watchDot : '#fff'}
        strokeWidth={hollow ? 2 : 1.5}
      />
    )
  }
  const colour = hollow ? CHART_COLOURS.system : CHART_COLOURS.tank
  return <circle className="reading-dot reading-dot-ok" cx={cx} cy={cy} r={3.5} fill={hollow ? '#fff' : colour} stroke={colour} strokeWidth={1.5} />
}
