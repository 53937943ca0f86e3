import { CartesianGrid, ComposedChart, Line, ReferenceArea, XAxis, YAxis } from 'recharts'
import type { DotItemDotProps } from 'recharts'
import type { TankLimit } from '#shared/schemas/tank-page'
import { bandAreas, valueScale } from '../utils/band-areas'
import { BAND_FILL_OPACITY, CHART_COLOURS } from '../utils/chart-colours'
import { formatTick, formatValue } from '../utils/format'
import { dayTicks } from '../utils/time-ticks'
import type { TrendPoint } from '../utils/trend-series'
import { DotShape } from './dot-shape'

interface TrendChartProps {
  limit: TankLimit
  tank: TrendPoint[]
  system: TrendPoint[]
  from: number
  to: number
  timeZone: string
}

const dot = (hollow: boolean) =>
  function ReadingDot({ cx, cy, payload, index }: DotItemDotProps) {
    if (cx == null || cy == null) return <g key={index} />
    return <DotShape key={index} band={(payload as TrendPoint).band} cx={cx} cy={cy} hollow={hollow} />
  }

/** One parameter over time: the ok, watch and critical bands shaded behind the tank's and the system's readings. */
export function TrendChart({ limit, tank, system, from, to, timeZone }: TrendChartProps) {
  const { domain, ticks } = valueScale(
    [...tank, ...system].map((p) => p.value),
    limit,
  )
  return (
    <ComposedChart responsive style={{ width: '100%', height: 240 }} margin={{ top: 8, right: 12, bottom: 4, left: 0 }} title={`${limit.name} over time`}>
      <CartesianGrid stroke={CHART_COLOURS.grid} strokeDasharray="3 3" />
      <XAxis
        type="number"
        dataKey="t"
        scale="time"
        domain={[from, to]}
        allowDataOverflow
        ticks={dayTicks(from, to, timeZone)}
        tickFormatter={(v: number) => formatTick(v, timeZone)}
        stroke={CHART_COLOURS.axis}
        fontSize={12}
        minTickGap={24}
      />
      <YAxis type="number" domain={domain} ticks={ticks} allowDataOverflow tickFormatter={formatValue} stroke={CHART_COLOURS.axis} fontSize={12} width={52} />
      {bandAreas(limit, domain).map((a, i) => (
        <ReferenceArea
          key={i}
          y1={a.y1}
          y2={a.y2}
          ifOverflow="hidden"
          fill={CHART_COLOURS[a.band]}
          fillOpacity={BAND_FILL_OPACITY}
          className={`band-area band-area-${a.band}`}
        />
      ))}
      {system.length > 0 && (
        <Line
          data={system}
          dataKey="value"
          name="System"
          stroke={CHART_COLOURS.system}
          strokeWidth={1.5}
          strokeDasharray="5 4"
          dot={dot(true)}
          activeDot={false}
          isAnimationActive={false}
        />
      )}
      {tank.length > 0 && (
        <Line
          data={tank}
          dataKey="value"
          name="Tank"
          stroke={CHART_COLOURS.tank}
          strokeWidth={2}
          dot={dot(false)}
          activeDot={false}
          isAnimationActive={false}
        />
      )}
    </ComposedChart>
  )
}
