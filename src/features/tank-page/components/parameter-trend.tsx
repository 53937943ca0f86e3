import { Calculator } from 'lucide-react'
import { useId } from 'react'
import type { TrendParameter } from '../utils/trend-series'
import { BandLegend } from './band-legend'
import { FlaggedReadings } from './flagged-readings'
import { TrendChart } from './trend-chart'

interface ParameterTrendProps {
  parameter: TrendParameter
  from: number
  to: number
  timeZone: string
  systemLabel: string | null
}

/** One parameter's card: the chart, its key in words and the flagged readings as a list. */
export function ParameterTrend({ parameter, from, to, timeZone, systemLabel }: ParameterTrendProps) {
  const id = useId()
  const { limit, tank, system } = parameter
  return (
    <section aria-labelledby={id} className="flex min-w-0 flex-col gap-3 rounded-xl border border-tide-200 bg-white p-3 break-inside-avoid md:p-4">
      <h3 id={id} className="flex flex-wrap items-center gap-x-2 text-lg font-bold text-tide-900">
        {limit.name}
        {limit.unit && <span className="text-sm font-normal text-tide-700">({limit.unit})</span>}
        {limit.derived && (
          <span className="inline-flex items-center gap-1 text-sm font-semibold text-tide-700">
            <Calculator aria-hidden className="size-4" /> worked out
          </span>
        )}
      </h3>
      <p className="text-sm text-tide-700">
        {tank.length} tank reading{tank.length === 1 ? '' : 's'}
        {system.length > 0 && `, ${system.length} at the system`}
      </p>
      <TrendChart limit={limit} tank={tank} system={system} from={from} to={to} timeZone={timeZone} />
      <BandLegend limit={limit} systemLabel={system.length > 0 ? systemLabel : null} />
      <FlaggedReadings limit={limit} tank={tank} system={system} systemLabel={systemLabel} timeZone={timeZone} />
    </section>
  )
}
