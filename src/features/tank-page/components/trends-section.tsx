import type { TrendRange } from '../api/tank-page-queries'
import type { TankReadings } from '#shared/schemas/tank-page'
import type { TrendParameter } from '../utils/trend-series'
import { MortalityChart } from './mortality-chart'
import { ParameterChoice } from './parameter-choice'
import { ParameterTrend } from './parameter-trend'
import { RangeChoice } from './range-choice'

interface TrendsSectionProps {
  readings: TankReadings & { from: number; to: number }
  parameters: TrendParameter[]
  selected: string[]
  days: TrendRange
  timeZone: string
  systemLabel: string | null
  onDaysChange: (days: TrendRange) => void
  onSelectedChange: (keys: string[]) => void
}

/** Trend charts for the chosen range and parameters, then deaths per day. */
export function TrendsSection({ readings, parameters, selected, days, timeZone, systemLabel, onDaysChange, onSelectedChange }: TrendsSectionProps) {
  const shown = parameters.filter((p) => selected.includes(p.limit.key))
  return (
    <section aria-labelledby="trends-heading" className="flex flex-col gap-3">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <h2 id="trends-heading" className="text-xl font-bold text-tide-900">
          Trends <span className="text-base font-normal text-tide-700">· last {days} days</span>
        </h2>
        <RangeChoice value={days} onChange={onDaysChange} />
      </div>
      {parameters.length === 0 ? (
        <p className="rounded-xl border border-dashed border-tide-300 bg-white p-4 text-tide-700">
          No readings at this tank or its system in the last {days} days.
        </p>
      ) : (
        <>
          <ParameterChoice parameters={parameters} selected={selected} onChange={onSelectedChange} />
          {shown.length === 0 && <p className="text-tide-700">Choose a reading above to draw its chart.</p>}
          <div className="grid gap-3 xl:grid-cols-2">
            {shown.map((p) => (
              <ParameterTrend key={p.limit.key} parameter={p} from={readings.from} to={readings.to} timeZone={timeZone} systemLabel={systemLabel} />
            ))}
          </div>
        </>
      )}
      <MortalityChart days={readings.mortalityByDay} />
    </section>
  )
}
