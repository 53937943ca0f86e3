import { CartesianGrid, Line, LineChart, XAxis, YAxis } from 'recharts'
import type { ComplianceRow } from '#shared/schemas/report'
import { onTimeTrend, overallOnTime } from '../utils/on-time'

/** The on-time rate per period across all groups, small, with the overall figure in words. */
export function OnTimeChart({ rows }: { rows: ComplianceRow[] }) {
  const points = onTimeTrend(rows)
  const overall = overallOnTime(rows)
  return (
    <figure className="flex flex-col gap-2 rounded-xl border border-tide-200 bg-white p-3 break-inside-avoid">
      <figcaption className="text-sm text-tide-800">
        <span className="font-semibold text-tide-900">On time overall: {overall.rate === null ? 'nothing judged yet' : `${overall.rate}%`}</span>
        {overall.judged > 0 && ` of ${overall.judged} tasks that were due (held and still-open tasks left out)`}
      </figcaption>
      {points.length > 1 && (
        <LineChart
          responsive
          style={{ width: '100%', height: 150 }}
          data={points}
          margin={{ top: 8, right: 16, bottom: 0, left: 0 }}
          title="On-time rate per period"
        >
          <CartesianGrid stroke="#d5e9ee" strokeDasharray="3 3" />
          <XAxis dataKey="period" stroke="#265f75" fontSize={12} minTickGap={16} padding={{ left: 16, right: 16 }} />
          <YAxis domain={[0, 100]} ticks={[0, 50, 100]} unit="%" stroke="#265f75" fontSize={12} width={44} />
          <Line dataKey="rate" name="On time" stroke="#214e60" strokeWidth={2} dot={{ r: 3, fill: '#214e60' }} isAnimationActive={false} />
        </LineChart>
      )}
    </figure>
  )
}
