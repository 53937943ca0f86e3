import type { TankLimit } from '#shared/schemas/tank-page'
import { formatWhen, withUnit } from '../utils/format'
import type { TrendPoint } from '../utils/trend-series'
import { BandBadge } from '../../../components/ui/band-badge'

interface FlaggedReadingsProps {
  limit: TankLimit
  tank: TrendPoint[]
  system: TrendPoint[]
  systemLabel: string | null
  timeZone: string
}

/** The chart's flagged marks as text, newest first, for anyone who cannot see the chart. */
export function FlaggedReadings({ limit, tank, system, systemLabel, timeZone }: FlaggedReadingsProps) {
  const flagged = [...tank.map((p) => ({ ...p, where: 'This tank' })), ...system.map((p) => ({ ...p, where: systemLabel ?? 'System' }))]
    .filter((p) => p.band !== 'ok')
    .sort((a, b) => b.t - a.t)
  if (flagged.length === 0) return <p className="text-sm text-tide-700">No flagged {limit.name.toLowerCase()} readings in this range.</p>
  return (
    <div>
      <h4 className="text-sm font-semibold text-tide-900">Flagged readings ({flagged.length})</h4>
      <ul aria-label={`Flagged ${limit.name} readings`} className="mt-1 flex flex-col gap-1 text-sm">
        {flagged.map((p, i) => (
          <li key={`${p.where}-${p.t}-${i}`} className="flex flex-wrap items-center gap-x-2 gap-y-0.5">
            <BandBadge band={p.band} />
            <span className="font-semibold tabular-nums text-tide-900">{withUnit(p.value, limit.unit)}</span>
            <span className="text-tide-700">
              {p.where} · {formatWhen(p.t, timeZone)}
            </span>
          </li>
        ))}
      </ul>
    </div>
  )
}
