import { describeSample, sampleSizeForMean } from '#shared/stats/sample-stats'
import { statDecimals, type WeightEntry } from '../utils/weights'
import { SampleSizeNeeded } from './sample-size-needed'

function Stat({ label, id, value, unit, wide }: { label: string; id: string; value: string; unit?: string; wide?: boolean }) {
  return (
    <div className={wide ? 'col-span-2 rounded-lg bg-tide-50 px-3 py-2 sm:col-span-1' : 'rounded-lg bg-tide-50 px-3 py-2'}>
      <dt className="text-sm text-tide-700">{label}</dt>
      <dd className="text-xl font-bold whitespace-nowrap tabular-nums text-tide-900">
        <span data-testid={id}>{value}</span>
        {unit && <span className="text-base font-semibold text-tide-700"> {unit}</span>}
      </dd>
    </div>
  )
}

/** Live summary of the sample: n, mean, SD, CV, range and how many fish the chosen precision needs. */
export function WeighingStats({
  entries,
  allowedErrorPct,
  onAllowedErrorChange,
}: {
  entries: WeightEntry[]
  allowedErrorPct: number
  onAllowedErrorChange: (pct: number) => void
}) {
  const d = entries.length ? describeSample(entries.map((e) => e.grams)) : null
  const places = statDecimals(entries)
  const spread = d && d.n >= 2
  const needed = spread && d.cv > 0 ? sampleSizeForMean(d.cv, allowedErrorPct / 100) : null
  return (
    <section aria-label="Sample statistics" aria-live="polite" className="flex flex-col gap-2">
      <dl className="grid grid-cols-3 gap-2 sm:grid-cols-5">
        <Stat label="n" id="stat-n" value={String(d?.n ?? 0)} />
        <Stat label="Mean" id="stat-mean" value={d ? d.mean.toFixed(places) : '–'} unit={d ? 'g' : undefined} />
        <Stat label="SD" id="stat-sd" value={spread ? d.sd.toFixed(places) : '–'} unit={spread ? 'g' : undefined} />
        <Stat label="CV" id="stat-cv" value={spread ? (d.cv * 100).toFixed(1) : '–'} unit={spread ? '%' : undefined} />
        <Stat wide label="Min–max" id="stat-range" value={d ? `${d.min}–${d.max}` : '–'} unit={d ? 'g' : undefined} />
      </dl>
      {!spread && <p className="text-sm text-tide-600">SD and CV need at least 2 fish.</p>}
      <SampleSizeNeeded n={d?.n ?? 0} needed={needed} allowedErrorPct={allowedErrorPct} onChange={onAllowedErrorChange} />
    </section>
  )
}
