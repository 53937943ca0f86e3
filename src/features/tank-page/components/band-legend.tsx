import type { ReactNode } from 'react'
import type { TankLimit } from '../api/tank-page-schemas'
import { BAND_FILL_OPACITY, CHART_COLOURS } from '../utils/chart-colours'
import { criticalText, hasLimits, okText } from '../utils/limit-text'
import { DotShape } from './dot-shape'

function Swatch({ colour }: { colour: string }) {
  return (
    <svg aria-hidden viewBox="0 0 16 16" className="size-4 shrink-0">
      <rect x="0.5" y="0.5" width="15" height="15" rx="2" fill={colour} fillOpacity={BAND_FILL_OPACITY * 2} stroke={colour} />
    </svg>
  )
}

function Mark({ children }: { children: ReactNode }) {
  return (
    <svg aria-hidden viewBox="0 0 24 16" className="h-4 w-6 shrink-0">
      {children}
    </svg>
  )
}

function Item({ mark, children }: { mark: ReactNode; children: ReactNode }) {
  return (
    <li className="flex items-center gap-1.5">
      {mark}
      <span>{children}</span>
    </li>
  )
}

/** What the shading, lines and marks mean, in words beside each sample. */
export function BandLegend({ limit, systemLabel }: { limit: TankLimit; systemLabel: string | null }) {
  const limited = hasLimits(limit)
  return (
    <ul aria-label={`Key to the ${limit.name} chart`} className="flex flex-wrap gap-x-4 gap-y-1 text-sm text-tide-800">
      {limited && <Item mark={<Swatch colour={CHART_COLOURS.ok} />}>Ok band: {okText(limit, limit.unit)}</Item>}
      {limited && <Item mark={<Swatch colour={CHART_COLOURS.watch} />}>Watch band: outside ok</Item>}
      {limited && (limit.criticalMin != null || limit.criticalMax != null) && (
        <Item mark={<Swatch colour={CHART_COLOURS.critical} />}>Critical band: {criticalText(limit, limit.unit)}</Item>
      )}
      {!limited && <li>No limits set for this reading.</li>}
      <Item mark={<Mark><line x1="0" y1="8" x2="24" y2="8" stroke={CHART_COLOURS.tank} strokeWidth="2" /><DotShape band="ok" cx={12} cy={8} /></Mark>}>This tank</Item>
      {systemLabel && (
        <Item mark={<Mark><line x1="0" y1="8" x2="24" y2="8" stroke={CHART_COLOURS.system} strokeWidth="2" strokeDasharray="4 3" /><DotShape band="ok" cx={12} cy={8} hollow /></Mark>}>
          {systemLabel} (dashed, hollow marks)
        </Item>
      )}
      <Item mark={<Mark><DotShape band="watch" cx={12} cy={8} /></Mark>}>Watch reading (diamond)</Item>
      <Item mark={<Mark><DotShape band="critical" cx={12} cy={8} /></Mark>}>Critical reading (triangle)</Item>
    </ul>
  )
}
