import { useId } from 'react'
import { Bar, BarChart, CartesianGrid, XAxis, YAxis } from 'recharts'
import { CHART_COLOURS } from '../utils/chart-colours'
import { formatLocalDay } from '../utils/format'

const shortDay = (date: string) => formatLocalDay(date).split(' ').slice(1, 3).join(' ')

/** Fish removed dead per facility day, from the mortality readings. */
export function MortalityChart({ days }: { days: Array<{ date: string; count: number }> }) {
  const id = useId()
  const total = days.reduce((sum, d) => sum + d.count, 0)
  const losses = days.filter((d) => d.count > 0)
  return (
    <section aria-labelledby={id} className="flex min-w-0 flex-col gap-2 rounded-xl border border-tide-200 bg-white p-3 break-inside-avoid md:p-4">
      <h3 id={id} className="text-lg font-bold text-tide-900">
        Mortalities per day
      </h3>
      {days.length === 0 ? (
        <p className="text-sm text-tide-700">No mortality counts recorded in this range.</p>
      ) : (
        <>
          <p className="text-sm text-tide-700">
            {total} removed in {days.length} day{days.length === 1 ? '' : 's'} counted; losses on {losses.length} day{losses.length === 1 ? '' : 's'}.
          </p>
          <BarChart
            responsive
            style={{ width: '100%', height: 180 }}
            data={days}
            margin={{ top: 8, right: 12, bottom: 4, left: 0 }}
            title="Mortalities per day"
          >
            <CartesianGrid stroke={CHART_COLOURS.grid} strokeDasharray="3 3" vertical={false} />
            <XAxis dataKey="date" tickFormatter={shortDay} stroke={CHART_COLOURS.axis} fontSize={12} minTickGap={16} />
            <YAxis allowDecimals={false} stroke={CHART_COLOURS.axis} fontSize={12} width={40} />
            <Bar dataKey="count" name="Mortalities" fill={CHART_COLOURS.bar} isAnimationActive={false} maxBarSize={28} />
          </BarChart>
          <ul aria-label="Days with losses" className="sr-only">
            {losses.map((d) => (
              <li key={d.date}>
                {formatLocalDay(d.date)}: {d.count}
              </li>
            ))}
          </ul>
        </>
      )}
    </section>
  )
}
