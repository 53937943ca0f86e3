import type { ReactNode } from 'react'
import type { TankLimit } from '#shared/schemas/tank-page'
import { BAND_FILL_OPACITY, CHART_COLOURS } from '../utils/chart-colours'
import { criticalText, hasLimits, okText } from '../utils/limit-text'
import { DotShape } from './dot-shape'
import { LegendItem } from './legend-item'

const swatch = (colour: string) => (
  <svg aria-hidden viewBox="0 0 16 16" className="size-4 shrink-0">
    <rect x="0.5" y="0.5" width="15" height="15" rx="2" fill={colour} fillOpacity={BAND_FILL_OPACITY * 2} stroke={colour} />
  </svg>
)

const mark = (drawing: ReactNode) => (
  <svg aria-hidden viewBox="0 0 24 16" className="h-4 w-6 shrink-0">
    {drawing}
  </svg>
)

/** What the shading, lines and marks mean, in words beside each sample. */
export function BandLegend({ limit, systemLabel }: { limit: TankLimit; systemLabel: string | null }) {
  const limited = hasLimits(limit)
  return (
    <ul aria-label={`Key to the ${limit.name} chart`} className="flex flex-wrap gap-x-4 gap-y-1 text-sm text-tide-800">
      {limited && <LegendItem mark={swatch(CHART_COLOURS.ok)}>Ok band: {okText(limit, limit.unit)}</LegendItem>}
      {limited && <LegendItem mark={swatch(CHART_COLOURS.watch)}>Watch band: outside ok</LegendItem>}
      {limited && (limit.criticalMin != null || limit.criticalMax != null) && (
        <LegendItem mark={swatch(CHART_COLOURS.critical)}>Critical band: {criticalText(limit, limit.unit)}</LegendItem>
      )}
      {!limited && <li>No limits set for this reading.</li>}
      <LegendItem
        mark={mark(
          <>
            <line x1="0" y1="8" x2="24" y2="8" stroke={CHART_COLOURS.tank} strokeWidth="2" />
            <DotShape band="ok" cx={12} cy={8} />
          </>,
        )}
      >
        This tank
      </LegendItem>
      {systemLabel && (
        <LegendItem
          mark={mark(
            <>
              <line x1="0" y1="8" x2="24" y2="8" stroke={CHART_COLOURS.system} strokeWidth="2" strokeDasharray="4 3" />
              <DotShape band="ok" cx={12} cy={8} hollow />
            </>,
          )}
        >
          {systemLabel} (dashed, hollow marks)
        </LegendItem>
      )}
      <LegendItem mark={mark(<DotShape band="watch" cx={12} cy={8} />)}>Watch reading (diamond)</LegendItem>
      <LegendItem mark={mark(<DotShape band="critical" cx={12} cy={8} />)}>Critical reading (triangle)</LegendItem>
    </ul>
  )
}
